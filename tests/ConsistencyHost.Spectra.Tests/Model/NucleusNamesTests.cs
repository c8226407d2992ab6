using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Tests.Model;

public sealed class NucleusNamesTests
{
    // Common practice: the labels chemists write in experimental sections and spectrometer exports.
    [Theory]
    [InlineData("1H", Nucleus.H1)]
    [InlineData("^1H", Nucleus.H1)]
    [InlineData("13C{1H}", Nucleus.C13)]
    [InlineData("c13", Nucleus.C13)]
    [InlineData("19F", Nucleus.F19)]
    [InlineData("31P", Nucleus.P31)]
    [InlineData("15N", Nucleus.Unknown)]
    [InlineData("", Nucleus.Unknown)]
    public void Parse_ConventionalLabel_GivesNucleus(string label, Nucleus expected) =>
        Assert.Equal(expected, NucleusNames.Parse(label));
}
