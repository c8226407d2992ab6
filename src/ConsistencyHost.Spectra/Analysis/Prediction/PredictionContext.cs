using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Rings;

namespace ConsistencyHost.Spectra.Analysis.Prediction;

/// <summary>
/// The perceived structure the shift and coupling predictions read: the molecule with its rings and perceived
/// aromaticity (independent of the Kekulé form submitted). Built once per molecule and shared.
/// </summary>
public sealed class PredictionContext
{
    private PredictionContext(Molecule molecule, RingSet rings, Aromaticity aromaticity)
    {
        Molecule = molecule;
        Rings = rings;
        Aromaticity = aromaticity;
    }

    /// <summary>The molecule.</summary>
    public Molecule Molecule { get; }

    /// <summary>Its smallest set of smallest rings.</summary>
    public RingSet Rings { get; }

    /// <summary>Perceived aromatic atoms and bonds.</summary>
    public Aromaticity Aromaticity { get; }

    /// <summary>Perceives rings and aromaticity of <paramref name="molecule"/>.</summary>
    public static PredictionContext Of(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var rings = RingSet.Of(molecule);
        return new PredictionContext(molecule, rings, Aromaticity.Of(molecule, rings));
    }

    /// <summary>
    /// The context of <paramref name="molecule"/> from rings and aromaticity already perceived for it (those the
    /// equivalence perception keeps), so a check does not perceive them twice.
    /// </summary>
    public static PredictionContext Of(Molecule molecule, RingSet rings, Aromaticity aromaticity)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(rings);
        ArgumentNullException.ThrowIfNull(aromaticity);
        return new PredictionContext(molecule, rings, aromaticity);
    }

    // Per-molecule facts of the carbon tables (Carbon/Core/RingFacts, Carbon/Aromatic/AromaticFacts), computed on
    // first use and kept here rather than in a static weak table: every checked entry brings a new context, and
    // weak-table entries are dependent GC handles that every collection has to trace.
    internal Carbon.Core.RingFacts? RingFactsSlot;
    internal Carbon.Aromatic.AromaticFacts? AromaticFactsSlot;

    /// <summary>The value in <paramref name="slot"/>, computed and published once (a racing thread's copy is dropped).</summary>
    internal T Facts<T>(ref T? slot, Func<PredictionContext, T> compute)
        where T : class =>
        Volatile.Read(ref slot) ?? Interlocked.CompareExchange(ref slot, compute(this), null) ?? slot!;

    /// <summary>True when the atom is perceived aromatic.</summary>
    public bool IsAromatic(int atom) => Aromaticity.AromaticAtoms[atom];

    /// <summary>True when the bond between two bonded atoms is perceived aromatic.</summary>
    public bool IsAromaticBond(int a, int b) => Aromaticity.AromaticBonds[Molecule.BondBetween(a, b)];
}
