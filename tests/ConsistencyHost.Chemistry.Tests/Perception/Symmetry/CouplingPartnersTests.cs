using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

/// <summary>Coupling partners from the bond graph. Common practice (first-order coupling paths: 2J geminal,
/// 3J vicinal, 4J allylic and aromatic meta; H–F and H–P couplings over up to three bonds).</summary>
public sealed class CouplingPartnersTests
{
    [Fact]
    public void Of_Propene_ListsGeminalVicinalAndAllylicPartners()
    {
        // C=CC: classes [0] (=CH2 a), [0] (=CH2 b), [1] (=CH), [2,2,2] (CH3)
        var e = NmrEquivalence.Of(SmilesReader.Read("C=CC").Value!);
        var h = e.HydrogenClasses;
        Assert.Equal(4, h.Length);
        Assert.Equal([1], h[0].Geminal2J.ToArray());
        Assert.Equal([2], h[0].Vicinal3J.ToArray());
        Assert.Equal([3], h[0].LongRange4J.ToArray()); // allylic =CH2 / CH3
        Assert.Equal([0, 1, 3], h[2].Vicinal3J.ToArray());
        Assert.Equal([0, 1], h[3].LongRange4J.ToArray());
    }

    [Fact]
    public void Of_Fluoroethane_ListsFluorineWithinThreeBonds()
    {
        var h = NmrEquivalence.Of(SmilesReader.Read("CCF").Value!).HydrogenClasses;
        Assert.Equal([2], h[0].HeteronuclearNeighbours.ToArray()); // H-C-C-F, 3J(H,F)
        Assert.Equal([2], h[1].HeteronuclearNeighbours.ToArray()); // H-C-F, 2J(H,F)
        Assert.Equal([1], h[0].Vicinal3J.ToArray());
    }

    [Fact]
    public void Of_TrimethylPhosphate_ListsPhosphorusThreeBondsAway()
    {
        var h = NmrEquivalence.Of(SmilesReader.Read("COP(=O)(OC)OC").Value!).HydrogenClasses;
        var methyl = Assert.Single(h);
        Assert.Equal([2], methyl.HeteronuclearNeighbours.ToArray()); // H-C-O-P, 3J(H,P) ≈ 11 Hz
        Assert.Equal([0, 0, 0, 5, 5, 5, 7, 7, 7], methyl.ParentAtoms.ToArray());
    }

    [Fact]
    public void Of_Phenol_FlagsOnlyTheOhAsExchangeable()
    {
        var e = NmrEquivalence.Of(SmilesReader.Read("Oc1ccccc1").Value!);
        Assert.Equal([true, false, false, false], e.ExchangeableHydrogens.ToArray());
        Assert.Equal(4, e.Expected1H.Max);
        Assert.Equal(3, e.Expected1H.Min);
    }
}
