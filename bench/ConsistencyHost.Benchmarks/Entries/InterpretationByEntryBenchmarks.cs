using BenchmarkDotNet.Attributes;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Benchmarks.Entries;

/// <summary>1H interpretation and assignment of each entry of the mix alone, to show which one dominates.</summary>
[BenchmarkCategory("entry")]
public class InterpretationByEntryBenchmarks
{
    private Entry _entry = null!;

    /// <summary>The entry to interpret.</summary>
    [ParamsSource(nameof(EntryIds))]
    public string EntryId { get; set; } = "";

    /// <summary>The ids of the mix.</summary>
    public static IEnumerable<string> EntryIds() => EntryMix.All.Select(e => e.EntryId);

    [GlobalSetup]
    public void Setup() => _entry = EntryFixture.Create().Entries.Single(e => e.EntryId == EntryId);

    /// <summary>ProtonInterpreter.Interpret on the entry's 1H spectrum, perception warm.</summary>
    [Benchmark]
    public int Interpret()
    {
        var kept = 0;
        foreach (var spectrum in _entry.Spectra)
        {
            if (spectrum.Nucleus != Nucleus.H1) continue;
            kept += ProtonInterpreter.Interpret(spectrum, _entry.Molecule!, _entry.Perception!.Equivalence).CompoundSignals.Count;
        }

        return kept;
    }
}
