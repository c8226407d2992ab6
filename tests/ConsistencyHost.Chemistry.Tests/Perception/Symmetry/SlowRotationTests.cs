using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

/// <summary>Slow amide C–N rotation widens the expected range upwards (nmr-methods.md §2.6).</summary>
public sealed class SlowRotationTests
{
    [Fact]
    public void Of_Dmf_AllowsTwoNMethylSignals()
    {
        // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512: DMF in CDCl3 8.02, 2.96, 2.88 (three signals).
        var e = NmrEquivalence.Of(SmilesReader.Read("CN(C)C=O").Value!);
        Assert.Equal(2, e.HydrogenClasses.Length); // fast-exchange classes
        Assert.Equal((2, 3), (e.Expected1H.Min, e.Expected1H.Max));
        Assert.Equal((2, 3), (e.Expected13C.Min, e.Expected13C.Max)); // 13C: 162.6, 36.5, 31.4 (same source)
        Assert.Contains(e.Expected1H.Reasons, r => r.Contains("amide", StringComparison.Ordinal));
    }

    [Fact]
    public void Of_Acetamide_AllowsTwoNhSignals()
    {
        // Common practice: a primary amide's NH2 protons are cis/trans to O and often appear as two broad signals.
        var e = NmrEquivalence.Of(SmilesReader.Read("CC(N)=O").Value!);
        Assert.Equal((1, 3), (e.Expected1H.Min, e.Expected1H.Max));
    }

    [Fact]
    public void Of_EthylAcetate_HasNoRotamerAllowance()
    {
        var e = NmrEquivalence.Of(SmilesReader.Read("CCOC(C)=O").Value!);
        Assert.Equal((3, 3), (e.Expected1H.Min, e.Expected1H.Max));
        Assert.Empty(e.Expected1H.Reasons);
    }
}
