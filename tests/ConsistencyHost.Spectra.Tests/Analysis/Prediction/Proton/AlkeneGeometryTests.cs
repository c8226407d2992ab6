namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Proton;

/// <summary>Cis and trans follow the drawn double-bond geometry; an unspecified one covers both.</summary>
public sealed class AlkeneGeometryTests
{
    // Source (from memory of Pretsch, Bühlmann & Badertscher 2009): methyl (E)-cinnamate H-β 7.69, H-α 6.44;
    // methyl (Z)-cinnamate H-β 6.95, H-α 5.95 (CDCl3).
    private const string Trans = "COC(=O)/C=C/c1ccccc1";
    private const string Cis = "COC(=O)/C=C\\c1ccccc1";
    private const string Unspecified = "COC(=O)C=Cc1ccccc1";

    [Theory]
    [InlineData(Trans, 5, 7.69)]
    [InlineData(Trans, 4, 6.44)]
    [InlineData(Cis, 5, 6.95)]
    [InlineData(Cis, 4, 5.95)]
    [InlineData(Unspecified, 5, 7.69)]
    [InlineData(Unspecified, 5, 6.95)]
    [InlineData(Unspecified, 4, 6.44)]
    [InlineData(Unspecified, 4, 5.95)]
    public void MethylCinnamates_ObservedShiftLiesInTheWindowOfTheDrawnGeometry(string smiles, int atom, double observed)
    {
        ProtonWindows.AssertHolds(smiles, atom, "CDCl3", observed);
    }

    [Fact]
    public void BetaProtonOfTheE_Isomer_IsOutsideTheZ_Window()
    {
        // The whole point of the geometry: E H-β 7.69 (from memory, as above) must not fit a drawn Z isomer.
        var z = ProtonWindows.For(Cis, 5, "CDCl3");
        Assert.False(z.Window.Contains(7.69), ProtonWindows.Describe(z));
    }

    [Fact]
    public void UnspecifiedGeometry_IsWiderThanEitherDrawnOne_AndSaysWhy()
    {
        var open = ProtonWindows.For(Unspecified, 5, "CDCl3");
        Assert.True(open.Window.Width > ProtonWindows.For(Trans, 5, "CDCl3").Window.Width);
        Assert.True(open.Window.Width > ProtonWindows.For(Cis, 5, "CDCl3").Window.Width);
        Assert.Contains(open.Reasons, r => r.StartsWith("E/Z not given", StringComparison.Ordinal));
    }
}
