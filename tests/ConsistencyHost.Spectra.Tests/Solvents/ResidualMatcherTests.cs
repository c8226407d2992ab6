using ConsistencyHost.Spectra.Jcamp;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Reported;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Tests.Solvents;

public sealed class ResidualMatcherTests
{
    private static readonly ResidualMatcher Matcher = new();

    [Fact]
    public void Match_EthylAcetateTextInCdcl3_FindsSolventWaterAndThreeGroups()
    {
        var spectrum = ReportedTextReader.Read(ImpurityFixtures.EthylAcetateText).Spectra.Single();
        var result = Matcher.Match(spectrum);
        Assert.True(result.SolventKnown);
        // Source: Gottlieb 1997 Table 1: CHCl3 7.26, water 1.56 in CDCl3.
        Assert.Contains(result.Matches, m => m.SignalIndex == 0 && m.Kind == ResidualMatchKind.ResidualSolvent);
        Assert.Contains(result.Matches, m => m.SignalIndex == 3 && m.Kind == ResidualMatchKind.Water);
        var ethylAcetate = Assert.Single(result.Impurities, e => e.Impurity.Name == "ethyl acetate");
        Assert.Equal((3, 3, true), (ethylAcetate.MatchedGroups, ethylAcetate.TabulatedGroups, ethylAcetate.MeetsMinimum));
    }

    [Fact]
    public void Match_DiethylEtherJcampInDmso_FindsBothGroupsAndWater()
    {
        var spectrum = JcampReader.Read(ImpurityFixtures.DiethylEtherInDmsoHz).Spectra.Single();
        var result = Matcher.Match(spectrum);
        Assert.True(Assert.Single(result.Impurities, e => e.Impurity.Name == "diethyl ether").TwoOrMoreGroups);
        Assert.Contains(result.Matches, m => m.SignalIndex == 2 && m.Kind == ResidualMatchKind.Water && m.ReferencePpm == 3.33);
    }

    [Fact]
    public void Match_TolueneCarbonTextInDmso_FindsSolventLineAndFiveTolueneCarbons()
    {
        var spectrum = ReportedTextReader.Read(ImpurityFixtures.TolueneCarbonText).Spectra.Single();
        var result = Matcher.Match(spectrum);
        // Source: Fulmer 2010 Table 2 (via a transcription): DMSO-d6 39.52; toluene 137.35, 128.88, 128.18, 125.29, 20.99.
        Assert.Equal(4, Assert.Single(result.Matches, m => m.Kind == ResidualMatchKind.ResidualSolvent).SignalIndex);
        Assert.Equal(5, Assert.Single(result.Impurities, e => e.Impurity.Name == "toluene").MatchedGroups);
    }

    [Fact]
    public void Match_SingleAcetoneLine_IsEvidenceButBelowMinimum()
    {
        // Source: Gottlieb 1997 Table 1: acetone CH3 2.17 in CDCl3.
        var signals = new[] { new Signal { ShiftPpm = 2.17, Multiplicity = "s" } };
        var acetone = Assert.Single(Matcher.Match(Nucleus.H1, "CDCl3", signals).Impurities, e => e.Impurity.Name == "acetone");
        Assert.False(acetone.MeetsMinimum);
        Assert.False(acetone.TwoOrMoreGroups);
    }

    [Fact]
    public void Match_RangeContainingResidualLine_Matches()
    {
        var range = new Signal { RangeLowPpm = 7.20, RangeHighPpm = 7.35, Multiplicity = "m" };
        var result = Matcher.Match(Nucleus.H1, "chloroform-d", [range]);
        Assert.Contains(result.Matches, m => m.Kind == ResidualMatchKind.ResidualSolvent && m.DeviationPpm == 0);
    }

    [Fact]
    public void Match_ProtonJustOutsideWindow_DoesNotMatchResidual()
    {
        var result = Matcher.Match(Nucleus.H1, "CDCl3", [new Signal { ShiftPpm = 7.30 }]);
        Assert.DoesNotContain(result.Matches, m => m.Kind == ResidualMatchKind.ResidualSolvent);
    }

    [Fact]
    public void Match_UnknownSolvent_MatchesNothing()
    {
        var result = Matcher.Match(Nucleus.H1, "pyridine-d5", [new Signal { ShiftPpm = 7.26 }]);
        Assert.False(result.SolventKnown);
        Assert.Empty(result.Matches);
    }

    [Fact]
    public void Match_NarrowerOptions_AreHonoured()
    {
        var strict = new ResidualMatcher(ResidualMatchOptions.Default with { ProtonWindowPpm = 0.005 });
        var matches = strict.Match(Nucleus.H1, "CDCl3", [new Signal { ShiftPpm = 7.27 }]).Matches;
        Assert.DoesNotContain(matches, m => m.Kind == ResidualMatchKind.ResidualSolvent);
    }
}
