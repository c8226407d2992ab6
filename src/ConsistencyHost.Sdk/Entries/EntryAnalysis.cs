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
    private readonly Lazy<IReadOnlyList<CouplingTree>?> _couplings;

    /// <summary>Prepares lazy analyses for <paramref name="spectra"/> against <paramref name="perception"/>.</summary>
    public EntryAnalysis(IReadOnlyList<Spectrum> spectra, StructurePerception? perception)
    {
        ArgumentNullException.ThrowIfNull(spectra);
        Spectra = spectra;
        Perception = perception;
        _protons = [.. spectra.Select(s => new Lazy<ProtonInterpretation?>(() => InterpretProtons(s, perception), LazyThreadSafetyMode.ExecutionAndPublication))];
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
    /// The first-order coupling tree of every hydrogen class (in class order), built once per entry; null when
    /// the entry has no structure.
    /// </summary>
    public IReadOnlyList<CouplingTree>? Couplings => _couplings.Value;

    private static IReadOnlyList<CouplingTree>? BuildCouplings(StructurePerception? perception) =>
        perception is null ? null : CouplingTreeBuilder.Build(
            PredictionContext.Of(perception.Molecule, perception.Equivalence.Rings, perception.Equivalence.Aromaticity), perception.Equivalence);

    private static ProtonInterpretation? InterpretProtons(Spectrum spectrum, StructurePerception? perception) =>
        spectrum.Nucleus == Nucleus.H1 && perception is not null
            ? ProtonInterpreter.Interpret(spectrum, perception.Molecule, perception.Equivalence)
            : null;
}
