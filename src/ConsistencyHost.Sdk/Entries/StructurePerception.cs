using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Analysis.Prediction;

namespace ConsistencyHost.Sdk.Entries;

/// <summary>
/// What the host perceives of an entry's structure, computed once on first use and shared by every rule
/// of the request (thread-safe). Each part is an immutable result computed from the molecule.
/// </summary>
public sealed class StructurePerception
{
    private readonly Lazy<MolecularFormula> _formula;
    private readonly Lazy<NmrEquivalence> _equivalence;
    private readonly Lazy<PredictionContext> _prediction;

    /// <summary>Starts lazy perception of <paramref name="molecule"/>.</summary>
    public StructurePerception(Molecule molecule)
    {
        Molecule = molecule ?? throw new ArgumentNullException(nameof(molecule));
        _formula = new Lazy<MolecularFormula>(() => MolecularFormula.Of(molecule), LazyThreadSafetyMode.ExecutionAndPublication);
        _equivalence = new Lazy<NmrEquivalence>(() => NmrEquivalence.Of(molecule), LazyThreadSafetyMode.ExecutionAndPublication);
        // Reuses the rings and aromaticity the equivalence perception already found, so a check perceives them once.
        _prediction = new Lazy<PredictionContext>(
            () => PredictionContext.Of(molecule, Equivalence.Rings, Equivalence.Aromaticity), LazyThreadSafetyMode.ExecutionAndPublication);
    }

    /// <summary>The molecule perceived.</summary>
    public Molecule Molecule { get; }

    /// <summary>Formula with charge, monoisotopic and average mass.</summary>
    public MolecularFormula Formula => _formula.Value;

    /// <summary>Stereo-aware hydrogen and carbon classes, coupling partners and expected signal counts.</summary>
    public NmrEquivalence Equivalence => _equivalence.Value;

    /// <summary>Rings and perceived aromaticity, as the shift and coupling predictions read them.</summary>
    public PredictionContext Prediction => _prediction.Value;
}
