using System.Collections.Concurrent;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Coupling;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Entries;

/// <summary>
/// Analyses of an entry's spectra against its structure with the default windows, computed on first use and
/// shared by every rule of the request (thread-safe). A rule with its own windows calls
/// <see cref="ProtonInterpreter"/> itself.
/// </summary>
public sealed class EntryAnalysis
{
    private readonly Lazy<ProtonInterpretation?>[] _protons;
    private readonly ConcurrentDictionary<string, Lazy<ClassShifts>> _shiftsBySolvent = new(StringComparer.Ordinal);
    private readonly Lazy<IReadOnlyList<CouplingTree>?> _couplings;

    /// <summary>Prepares lazy analyses for <paramref name="spectra"/> against <paramref name="perception"/>.</summary>
    public EntryAnalysis(IReadOnlyList<Spectrum> spectra, StructurePerception? perception)
    {
        ArgumentNullException.ThrowIfNull(spectra);
        Spectra = spectra;
        Perception = perception;
        _protons = [.. spectra.Select(s => new Lazy<ProtonInterpretation?>(() => InterpretProtons(s), LazyThreadSafetyMode.ExecutionAndPublication))];
        _couplings = new Lazy<IReadOnlyList<CouplingTree>?>(() => BuildCouplings(perception), LazyThreadSafetyMode.ExecutionAndPublication);
    }

    internal IReadOnlyList<Spectrum> Spectra { get; }

    internal StructurePerception? Perception { get; }

    /// <summary>
    /// The interpretation of the 1H spectrum at <paramref name="spectrumIndex"/>; null when that spectrum is not
    /// 1H or the entry has no structure.
    /// </summary>
    public ProtonInterpretation? Protons(int spectrumIndex) =>
        spectrumIndex >= 0 && spectrumIndex < _protons.Length ? _protons[spectrumIndex].Value : null;

    /// <summary>
    /// The predicted 1H and 13C shift window of every class of the structure in the solvent of the spectrum at
    /// <paramref name="spectrumIndex"/>; computed once per solvent and shared. Null when the entry has no
    /// structure or the index is out of range.
    /// </summary>
    public ClassShifts? Shifts(int spectrumIndex) =>
        spectrumIndex >= 0 && spectrumIndex < Spectra.Count ? ShiftsIn(Spectra[spectrumIndex].Solvent) : null;

    /// <summary>The predicted class windows in <paramref name="solvent"/> (any spelling; null when not stated); null without a structure.</summary>
    public ClassShifts? ShiftsIn(string? solvent)
    {
        if (Perception is not { } perception) return null;
        var key = SolventNames.Normalise(solvent) ?? "";
        return _shiftsBySolvent.GetOrAdd(key, _ => new Lazy<ClassShifts>(
            () => ClassShifts.Of(perception.Prediction, perception.Equivalence, solvent), LazyThreadSafetyMode.ExecutionAndPublication)).Value;
    }

    /// <summary>
    /// The first-order coupling tree of every hydrogen class (in class order), built once per entry; null when
    /// the entry has no structure.
    /// </summary>
    public IReadOnlyList<CouplingTree>? Couplings => _couplings.Value;

    private static IReadOnlyList<CouplingTree>? BuildCouplings(StructurePerception? perception) =>
        perception is null ? null : CouplingTreeBuilder.Build(perception.Prediction, perception.Equivalence);

    // The class windows in the spectrum's solvent let the solver prefer, among equally good readings, the one
    // whose shifts fit (shared with the rules that read the windows themselves).
    private ProtonInterpretation? InterpretProtons(Spectrum spectrum) =>
        spectrum.Nucleus == Nucleus.H1 && Perception is { } perception
            ? ProtonInterpreter.Interpret(spectrum, perception.Molecule, perception.Equivalence, hydrogenWindows: ShiftsIn(spectrum.Solvent)!.Hydrogen)
            : null;
}
