using BenchmarkDotNet.Attributes;
using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Benchmarks.Entries;

/// <summary>
/// One operation = one entry of the mix (the mix is run whole and divided by its size). <see cref="Check"/> is
/// the engine end to end; the others are its stages, timed directly so their shares can be stated:
/// intake (structure and text reading), perception, 1H interpretation and assignment. Each rule alone is in
/// <see cref="RuleBenchmarks"/>.
/// </summary>
[BenchmarkCategory("entry")]
public class EntryBenchmarks
{
    private EntryFixture _fixture = null!;
    private readonly EntryIntake _intake = new(IntakeLimits.Default);

    private IReadOnlyList<ActiveRule> _rules = [];

    [GlobalSetup]
    public void Setup()
    {
        _fixture = EntryFixture.Create();
        _rules = _fixture.Engine.GetProfile(null).Rules;
    }

    /// <summary>The embedded engine end to end: intake, lazy perception and analysis, every rule, the report.</summary>
    [Benchmark(OperationsPerInvoke = EntryMix.Count)]
    public int Check()
    {
        var findings = 0;
        foreach (var submission in EntryMix.All) findings += _fixture.Engine.Check(submission).Findings.Count;
        return findings;
    }

    /// <summary>
    /// The same work as <see cref="Check"/> on one thread: intake, then every rule of the default profile called
    /// in turn (perception and interpretation computed lazily by the first rule that asks). Check minus this is
    /// the runner's cost: a task, a linked deadline and a stopwatch per rule, the waits, stamping and sorting.
    /// </summary>
    [Benchmark(OperationsPerInvoke = EntryMix.Count)]
    public int CheckInline()
    {
        var findings = 0;
        foreach (var submission in EntryMix.All)
        {
            var entry = _intake.Build(submission);
            foreach (var rule in _rules)
            {
                foreach (var _ in rule.Descriptor.Factory!().Check(entry, rule.Options, CancellationToken.None)) findings++;
            }
        }

        return findings;
    }

    /// <summary>Intake alone: SMILES and reported text read into an entry (no perception yet).</summary>
    [Benchmark(OperationsPerInvoke = EntryMix.Count)]
    public int Intake()
    {
        var spectra = 0;
        foreach (var submission in EntryMix.All) spectra += _intake.Build(submission).Spectra.Count;
        return spectra;
    }

    /// <summary>Perception alone: formula and stereo-aware classes of the parsed molecule.</summary>
    [Benchmark(OperationsPerInvoke = EntryMix.Count)]
    public int Perception()
    {
        var classes = 0;
        foreach (var entry in _fixture.Entries)
        {
            var molecule = entry.Molecule!;
            classes += MolecularFormula.Of(molecule).Counts.Count + NmrEquivalence.Of(molecule).HydrogenClasses.Length;
        }

        return classes;
    }

    /// <summary>1H interpretation and assignment alone, on warm perception.</summary>
    [Benchmark(OperationsPerInvoke = EntryMix.Count)]
    public int Interpretation()
    {
        var kept = 0;
        foreach (var entry in _fixture.Entries)
        {
            foreach (var spectrum in entry.Spectra)
            {
                if (spectrum.Nucleus != Nucleus.H1) continue;
                kept += ProtonInterpreter.Interpret(spectrum, entry.Molecule!, entry.Perception!.Equivalence).CompoundSignals.Count;
            }
        }

        return kept;
    }
}
