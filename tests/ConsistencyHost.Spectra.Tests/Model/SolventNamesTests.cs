using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Tests.Model;

public sealed class SolventNamesTests
{
    // Source: canonical names as printed in Gottlieb 1997 and Fulmer 2010 table headers; spellings Common practice.
    [Theory]
    [InlineData("cdcl3", "CDCl3")]
    [InlineData("CDCl₃", "CDCl3")]
    [InlineData("chloroform-d", "CDCl3")]
    [InlineData("DMSO-d6", "DMSO-d6")]
    [InlineData("d6-DMSO", "DMSO-d6")]
    [InlineData("(CD3)2SO", "DMSO-d6")]
    [InlineData("DMSO-d₆", "DMSO-d6")]
    [InlineData("CD3OD", "CD3OD")]
    [InlineData("methanol-d4", "CD3OD")]
    [InlineData("D2O", "D2O")]
    [InlineData("acetone-d6", "acetone-d6")]
    [InlineData("C6D6", "C6D6")]
    [InlineData("benzene-d6", "C6D6")]
    [InlineData("CD3CN", "CD3CN")]
    [InlineData("CD2Cl2", "CD2Cl2")]
    [InlineData("THF-d8", "THF-d8")]
    [InlineData("toluene-d8", "toluene-d8")]
    public void Normalise_KnownSpelling_GivesCanonicalName(string text, string expected) =>
        Assert.Equal(expected, SolventNames.Normalise(text));

    [Theory]
    [InlineData("CHCl3")]
    [InlineData("pyridine")]
    [InlineData("")]
    public void Normalise_UnknownText_GivesNull(string text) => Assert.Null(SolventNames.Normalise(text));
}
