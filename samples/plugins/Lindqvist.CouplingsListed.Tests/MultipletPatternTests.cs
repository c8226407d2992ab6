namespace Lindqvist.CouplingsListed.Tests;

public sealed class MultipletPatternTests
{
    // One J per letter of a first-order multiplicity; quint/sext/sept/hept name one (common practice).
    // Abbreviations as in the NMReDATA S= attribute. Source: Pupier et al., Magn. Reson. Chem. 2018, 56, 703.
    [Theory]
    [InlineData("s", 0)]
    [InlineData("m", 0)]
    [InlineData("d", 1)]
    [InlineData("q", 1)]
    [InlineData("dd", 2)]
    [InlineData("td", 2)]
    [InlineData("ddd", 3)]
    [InlineData("sept", 1)]
    [InlineData("hept", 1)]
    [InlineData("quint", 1)]
    [InlineData("DD", 2)]
    public void CouplingCount_ReportedMultiplicity_NamesThatManyCouplings(string multiplicity, int expected) =>
        Assert.Equal(expected, MultipletPattern.CouplingCount(multiplicity));

    [Theory]
    [InlineData("br d", "d", true)]
    [InlineData("br. s", "s", true)]
    [InlineData("app t", "t", false)]
    [InlineData("dd", "dd", false)]
    public void Strip_QualifiedMultiplicity_KeepsTheCoreAndTheBroadening(string reported, string core, bool broadened) =>
        Assert.Equal((core, broadened), MultipletPattern.Strip(reported));
}
