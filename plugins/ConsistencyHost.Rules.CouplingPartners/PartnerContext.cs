using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Coupling;
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
    Molecule? Molecule,
    EntryAnalysis Analysis,
    NmrEquivalence? Equivalence)
{
    public static PartnerContext Create(IEntryView entry, int spectrumIndex)
    {
        var spectrum = entry.Spectra[spectrumIndex];
        var interpretation = entry.Analysis.Protons(spectrumIndex);
        var compound = interpretation?.CompoundSignals ?? [.. Enumerable.Range(0, spectrum.Signals.Count)];
        return new PartnerContext(spectrum, spectrumIndex, compound, interpretation, entry.Molecule, entry.Analysis, entry.Perception?.Equivalence);
    }

    /// <summary>The coupling tree of every hydrogen class, shared through the entry view (built once per entry).</summary>
    public IReadOnlyList<CouplingTree>? Trees => Analysis.Couplings;

    /// <summary>The predicted 1H window of every hydrogen class in this spectrum's solvent (shared, computed once per entry).</summary>
    public IReadOnlyList<ShiftPrediction>? HydrogenWindows => Analysis.Shifts(SpectrumIndex)?.Hydrogen;

    /// <summary>What the partner search reads of each signal, in reported order (read once per spectrum).</summary>
    public IReadOnlyList<SignalFacts> Facts => _facts ??= [.. Spectrum.Signals.Select(SignalFacts.Of)];

    private SignalFacts[]? _facts;

    /// <summary>
    /// True when a signal may carry a coupling to 19F or 31P. Any F or P in the structure counts: H–F
    /// couplings over four and five bonds (4J ≈ 4–6 Hz to a meta proton of a fluoroarene) are routinely resolved
    /// (common practice), so limiting this to three bonds would raise false alarms.
    /// </summary>
    public bool MayCoupleToHeteronucleus() =>
        _hasHeteronucleus ??= Molecule is null || Molecule.Atoms.Any(a => a.AtomicNumber is 9 or 15);

    private bool? _hasHeteronucleus;
}
