using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// A 1H spectrum with what the structure says about it: which signals are the compound's, and — when the
/// proton counts allowed an assignment — which hydrogen classes each signal holds.
/// </summary>
internal sealed record PartnerContext(
    Spectrum Spectrum,
    int SpectrumIndex,
    IReadOnlyList<int> CompoundSignals,
    ProtonInterpretation? Interpretation,
    NmrEquivalence? Equivalence,
    Molecule? Molecule)
{
    public static PartnerContext Create(IEntryView entry, int spectrumIndex)
    {
        var spectrum = entry.Spectra[spectrumIndex];
        var interpretation = entry.Analysis.Protons(spectrumIndex);
        var compound = interpretation?.CompoundSignals ?? [.. Enumerable.Range(0, spectrum.Signals.Count)];
        return new PartnerContext(spectrum, spectrumIndex, compound, interpretation, entry.Perception?.Equivalence, entry.Molecule);
    }

    /// <summary>The classes the best assignment put in a signal; empty when there is no assignment.</summary>
    public IReadOnlyList<int> ClassesOf(int signal)
    {
        if (Interpretation?.Assignment is not { } assignment) return [];
        var k = IndexInCompound(signal);
        return k < 0 ? [] : assignment.ClassesBySignal[k];
    }

    /// <summary>
    /// The structure's hydrogen classes in a signal (a class split by slow exchange appears once, under its
    /// source class).
    /// </summary>
    public IReadOnlyList<int> StructureClassesOf(int signal)
    {
        // Built once per spectrum: partner look-ups ask for every signal's classes for every signal.
        _structureClasses ??= [.. Enumerable.Range(0, Spectrum.Signals.Count)
            .Select(s => (IReadOnlyList<int>)[.. ClassesOf(s).Select(c => Interpretation!.Classes[c].Source).Where(c => c >= 0).Distinct()])];
        return _structureClasses[signal];
    }

    private IReadOnlyList<int>[]? _structureClasses;

    /// <summary>The compound signals holding a class that couples (2J, 3J, 4J) to a class of <paramref name="signal"/>.</summary>
    public IReadOnlyList<int>? PartnerSignals(int signal)
    {
        if (Equivalence is null || StructureClassesOf(signal) is not { Count: > 0 } own) return null;
        var partners = own.SelectMany(c => Equivalence.HydrogenClasses[c].Geminal2J
                .Concat(Equivalence.HydrogenClasses[c].Vicinal3J)
                .Concat(Equivalence.HydrogenClasses[c].LongRange4J))
            .ToHashSet();
        return [.. CompoundSignals.Where(s => s != signal && StructureClassesOf(s).Any(partners.Contains))];
    }

    /// <summary>
    /// True when a signal may carry a coupling to 19F or 31P. Any F or P in the structure counts: H–F
    /// couplings over four and five bonds (4J ≈ 4–6 Hz to a meta proton of a fluoroarene) are routinely resolved
    /// (common practice), so limiting this to three bonds would raise false alarms.
    /// </summary>
    public bool MayCoupleToHeteronucleus() =>
        _hasHeteronucleus ??= Molecule is null || Molecule.Atoms.Any(a => a.AtomicNumber is 9 or 15);

    private bool? _hasHeteronucleus;

    private int IndexInCompound(int signal)
    {
        for (var k = 0; k < CompoundSignals.Count; k++)
        {
            if (CompoundSignals[k] == signal) return k;
        }

        return -1;
    }
}
