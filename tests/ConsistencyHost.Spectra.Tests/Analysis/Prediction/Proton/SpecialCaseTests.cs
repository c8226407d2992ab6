using ConsistencyHost.Spectra.Analysis.Prediction;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Proton;

/// <summary>Tabulated cases where additivity fails, and the order of the reasons.</summary>
public sealed class SpecialCaseTests
{
    // Source: Gottlieb, Kotlyar & Nudelman 1997, Table 1: CHCl3 7.26 (CDCl3), 8.32 (DMSO-d6); CH2Cl2 5.30, 5.76.
    [Theory]
    [InlineData("ClC(Cl)Cl", 1, "CDCl3", 7.26)]
    [InlineData("ClC(Cl)Cl", 1, "DMSO-d6", 8.32)]
    [InlineData("ClCCl", 1, "CDCl3", 5.30)]
    [InlineData("ClCCl", 1, "DMSO-d6", 5.76)]
    public void AcidicHalomethaneCH_FollowsTheSolvent(string smiles, int atom, string solvent, double published)
    {
        var p = ProtonWindows.For(smiles, atom, solvent);
        Assert.Equal(ShiftBasis.TabulatedEnvironment, p.Basis);
        Assert.Equal(published, p.Window.MostLikely, 2);
    }

    // Source (from memory of Pretsch, Bühlmann & Badertscher 2009): CH3I 2.16 and CH3Br 2.68, where one-group
    // additivity (0.9 + 2.0 / 2.1) would give 2.9 / 3.0; dimethoxymethane OCH2O 4.58 against 5.4 from summation;
    // cyclopropane 0.22; oxirane 2.54.
    [Theory]
    [InlineData("CI", 0, 2.16)]
    [InlineData("CBr", 0, 2.68)]
    [InlineData("COCOC", 2, 4.58)]
    [InlineData("C1CC1", 0, 0.22)]
    [InlineData("C1CO1", 0, 2.54)]
    public void KnownAdditivityFailures_AreCoveredByTabulatedOrCorrectedWindows(string smiles, int atom, double observed)
    {
        ProtonWindows.AssertHolds(smiles, atom, "CDCl3", observed);
    }

    // Source (from memory of Pretsch 2009): acetaldehyde CHO 9.79, benzaldehyde 10.0, DMF CHO 8.02 (Gottlieb 1997),
    // ethyl formate 8.06, phenylacetylene ≡CH 3.07, 1-hexyne ≡CH 1.94, (E)-benzaldoxime CH=N 8.17.
    [Theory]
    [InlineData("CC=O", 1, 9.79)]
    [InlineData("O=Cc1ccccc1", 1, 10.0)]
    [InlineData("CN(C)C=O", 3, 8.02)]
    [InlineData("CCOC=O", 3, 8.06)]
    [InlineData("C#Cc1ccccc1", 0, 3.07)]
    [InlineData("CCCCC#C", 5, 1.94)]
    [InlineData("O/N=C/c1ccccc1", 2, 8.17)]
    public void FormylAlkyneAndImineHydrogens_LieInTheirTabulatedWindow(string smiles, int atom, double observed)
    {
        ProtonWindows.AssertHolds(smiles, atom, "CDCl3", observed);
    }

    [Fact]
    public void EthylAcetateOCH2_ReasonsReadInTheOrderApplied()
    {
        var p = ProtonWindows.For("CCOC(C)=O", 1, "CDCl3");
        Assert.Equal("base CH2 (Beauchamp–Marquez) 1.20", p.Reasons[0]);
        Assert.Equal("α-OC(=O)R +2.80", p.Reasons[1]);
        Assert.StartsWith("±0.30:", p.Reasons[^1], StringComparison.Ordinal);
    }
}
