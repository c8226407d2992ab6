using ConsistencyHost.Spectra.Analysis.Prediction;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Proton;

/// <summary>O–H, N–H and S–H windows: class ranges that follow the solvent.</summary>
public sealed class ExchangeableWindowTests
{
    // Source: Gottlieb, Kotlyar & Nudelman 1997, Table 1 (read): ethanol OH 1.32 (CDCl3), 4.63 (DMSO-d6);
    // methanol OH (Fulmer 2010 transcription) 1.09 and 4.01.
    [Theory]
    [InlineData("CCO", 2, "CDCl3", 1.32)]
    [InlineData("CCO", 2, "DMSO-d6", 4.63)]
    [InlineData("CO", 1, "CDCl3", 1.09)]
    [InlineData("CO", 1, "DMSO-d6", 4.01)]
    public void AlcoholOH_PublishedImpurityValuesLieInTheSolventWindow(string smiles, int atom, string solvent, double published)
    {
        var p = ProtonWindows.For(smiles, atom, solvent);
        Assert.Equal(ShiftBasis.Exchangeable, p.Basis);
        Assert.True(p.Window.Contains(published), ProtonWindows.Describe(p));
    }

    // Common practice (from memory of Pretsch, Bühlmann & Badertscher 2009; Abraham et al., Magn. Reson. Chem. 2006,
    // 44, 491 — labile protons move by up to +4.6 ppm from CDCl3 to DMSO-d6): phenol OH ≈ 5 in CDCl3, ≈ 9.4 in
    // DMSO-d6; acetanilide NH ≈ 7.4 and 9.9; benzamide NH2 ≈ 6.0 and 7.4/8.0; indole NH 8.1 and 11.1;
    // benzimidazole NH 12.4 (DMSO-d6); benzoic acid OH ≈ 13 (DMSO-d6); 2-hydroxyacetophenone OH 12.3 (chelated).
    [Theory]
    [InlineData("Oc1ccccc1", 0, "CDCl3", 5.0)]
    [InlineData("Oc1ccccc1", 0, "DMSO-d6", 9.4)]
    [InlineData("CC(=O)Nc1ccccc1", 3, "CDCl3", 7.4)]
    [InlineData("CC(=O)Nc1ccccc1", 3, "DMSO-d6", 9.9)]
    [InlineData("NC(=O)c1ccccc1", 0, "DMSO-d6", 7.4)]
    [InlineData("NC(=O)c1ccccc1", 0, "DMSO-d6", 8.0)]
    [InlineData("c1ccc2[nH]ccc2c1", 4, "CDCl3", 8.1)]
    [InlineData("c1ccc2[nH]ccc2c1", 4, "DMSO-d6", 11.1)]
    [InlineData("c1ccc2[nH]cnc2c1", 4, "DMSO-d6", 12.4)]
    [InlineData("OC(=O)c1ccccc1", 0, "DMSO-d6", 12.9)]
    [InlineData("CC(=O)c1ccccc1O", 9, "CDCl3", 12.3)]
    public void CommonLabileProtons_LieInTheirSolventWindow(string smiles, int atom, string solvent, double typical)
    {
        ProtonWindows.AssertHolds(smiles, atom, solvent, typical);
    }

    [Fact]
    public void PhenolOH_MovesDownfieldFromChloroformToDmso()
    {
        var chloroform = ProtonWindows.For("Oc1ccccc1", 0, "CDCl3").Window;
        var dmso = ProtonWindows.For("Oc1ccccc1", 0, "DMSO-d6").Window;
        Assert.True(dmso.Low > chloroform.MostLikely, $"{dmso} vs {chloroform}");
    }

    [Fact]
    public void InDeuteratedMethanol_TheWindowSaysNormallyExchanged_AndHoldsTheSolventLine()
    {
        // Gottlieb 1997: the CD3OD exchange (OH) line is 4.87.
        var p = ProtonWindows.For("CC(C)O", 3, "CD3OD");
        Assert.Contains(p.Reasons, r => r.Contains("normally exchanged", StringComparison.Ordinal));
        Assert.True(p.Window.Contains(4.87), ProtonWindows.Describe(p));
    }

    [Fact]
    public void UnknownSolvent_CoversBothChloroformAndDmsoRanges()
    {
        // Phenol OH, common practice (values as in CommonLabileProtons above): ≈ 5.0 in CDCl3, ≈ 9.4 in DMSO-d6.
        var p = ProtonWindows.For("Oc1ccccc1", 0, null);
        Assert.True(p.Window.Contains(5.0) && p.Window.Contains(9.4), ProtonWindows.Describe(p));
    }
}
