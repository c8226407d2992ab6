using ConsistencyHost.Spectra.Jcamp;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Tests.Solvents;

namespace ConsistencyHost.Spectra.Tests.Jcamp;

public sealed class JcampReaderTests
{
    [Fact]
    public void Read_EthylAcetateLinkFile_GivesTwoPeakTablesWithMetadata()
    {
        var result = JcampReader.Read(ImpurityFixtures.EthylAcetateLinkFile);
        Assert.True(result.Succeeded, string.Join("; ", result.Problems.Select(p => p.Message)));
        Assert.Equal(3, result.Blocks.Count);
        Assert.Equal("LINK", result.Blocks[0].DataType);
        var (proton, carbon) = (result.Spectra[0], result.Spectra[1]);
        Assert.Equal((Nucleus.H1, (double?)400.13, "CDCl3", (double?)298.15), (proton.Nucleus, proton.FrequencyMHz, proton.Solvent, proton.TemperatureK));
        Assert.Equal([4.1467, 4.1289, 4.1111, 4.0933, 2.05, 1.2778, 1.26, 1.2422], proton.Signals.Select(s => s.ShiftPpm!.Value));
        Assert.Equal(300.0, proton.Signals[4].Integral);
        // Source: Gottlieb 1997 / Fulmer 2010 13C of ethyl acetate in CDCl3; S/T/Q letters from the fixture.
        Assert.Equal([171.36, 60.49, 21.04, 14.19], carbon.Signals.Select(s => s.ShiftPpm!.Value));
        Assert.Equal(["s", "t", "q", "q"], carbon.Signals.Select(s => s.Multiplicity));
        Assert.Equal("2", result.Blocks[2].BlockId);
        Assert.Equal("hand-written example", result.Blocks[2].Labels["ORIGIN"]);
    }

    [Fact]
    public void Read_HzTableWithFactorsAndOddLabels_ConvertsToPpm()
    {
        var result = JcampReader.Read(ImpurityFixtures.DiethylEtherInDmsoHz);
        Assert.True(result.Succeeded, string.Join("; ", result.Problems.Select(p => p.Message)));
        var spectrum = Assert.Single(result.Spectra);
        Assert.Equal("DMSO-d6", spectrum.Solvent);
        Assert.Equal(297, spectrum.TemperatureK);
        // Source: Gottlieb 1997 Table 1, DMSO-d6 column: 1.09 (CH3), 3.38 (CH2), water 3.33.
        Assert.Equal([1.09, 3.38, 3.33], spectrum.Signals.Select(s => Math.Round(s.ShiftPpm!.Value, 9)));
        Assert.Equal([300.0, 200.0, 50.0], spectrum.Signals.Select(s => s.Integral!.Value));
        Assert.Equal(1.2, spectrum.Signals[0].LineWidthHz!.Value, 9);
    }

    [Fact]
    public void Read_PeakAssignments_KeepsAssignmentText()
    {
        var result = JcampReader.Read(ImpurityFixtures.TriethylamineCarbonAssignments);
        Assert.True(result.Succeeded);
        var signals = Assert.Single(result.Spectra).Signals;
        Assert.Equal(["CH2", "CH3", "CDCl3"], signals.Select(s => s.Assignments.Single()));
        Assert.Equal([46.25, 11.61, 77.16], signals.Select(s => s.ShiftPpm!.Value));
    }

    [Fact]
    public void Read_BlankSeparatedNumbersAndSeveralTopLevelBlocks_ReadsEach()
    {
        const string text = """
            ##TITLE= first
            ##.OBSERVE NUCLEUS= ^19F
            ##PEAK TABLE= (XY..XY)
            -62.8 100 -113.5 40
            ##END=
            ##TITLE= second
            ##.OBSERVE NUCLEUS= ^31P
            ##PEAK TABLE= (XY..XY)
            29.5,10
            ##END=
            """;
        var result = JcampReader.Read(text);
        Assert.True(result.Succeeded);
        Assert.Equal([Nucleus.F19, Nucleus.P31], result.Spectra.Select(s => s.Nucleus));
        Assert.Equal([-62.8, -113.5], result.Spectra[0].Signals.Select(s => s.ShiftPpm!.Value));
    }

    [Fact]
    public void Read_TuplesOnTheVariableListLine_AreRead()
    {
        var result = JcampReader.Read("##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##PEAKTABLE=(XY..XY) 7.26,10.0 2.05,30.0\n1.26,20.0\n##END=");
        Assert.True(result.Succeeded, string.Join("; ", result.Problems.Select(p => p.Message)));
        Assert.Equal([7.26, 2.05, 1.26], result.Spectra.Single().Signals.Select(s => s.ShiftPpm!.Value));
    }

    public static TheoryData<string, int, int, string, string> BadInputs => new()
    {
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##PEAK TABLE= (XY..XY)\n1.0, 2.0\n", 5, 1, "", JcampMessages.ExpectedEnd },
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##PEAK TABLE= (XYZ..XYZ)\n1.0, 2.0\n##END=", 3, 14, "(XYZ..XYZ)", JcampMessages.ExpectedVariableList },
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##PEAK TABLE= (XY..XY)\n1.0, abc\n##END=", 4, 6, "abc", JcampMessages.ExpectedNumber },
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##NPOINTS= 3\n##PEAK TABLE= (XY..XY)\n1.0, 2.0\n##END=", 3, 11, "3", JcampMessages.ExpectedNpoints },
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##XUNITS= HZ\n##PEAK TABLE= (XY..XY)\n400.0, 2.0\n##END=", 3, 1, "##XUNITS= HZ", JcampMessages.ExpectedObserveFrequency },
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##XUNITS= SECONDS\n##PEAK TABLE= (XY..XY)\n1.0, 2.0\n##END=", 3, 1, "##XUNITS= SECONDS", JcampMessages.ExpectedKnownXUnits },
        { "##TITLE= t\n##.OBSERVE NUCLEUS ^1H\n##PEAK TABLE= (XY..XY)\n1.0, 2.0\n##END=", 2, 1, "##.OBSERVE NUCLEUS ^1H", JcampMessages.ExpectedLabelEquals },
        { "stray text\n##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##PEAK TABLE= (XY..XY)\n1.0, 2.0\n##END=", 1, 1, "stray text", JcampMessages.ExpectedLabelEquals },
        { "##ORIGIN= x\n##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##PEAK TABLE= (XY..XY)\n1.0, 2.0\n##END=", 1, 1, "##ORIGIN", JcampMessages.ExpectedTitleFirst },
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##PEAK TABLE= (XYW..XYW)\n1.0, 2.0\n##END=", 4, 1, "1.0,2.0", JcampMessages.ExpectedTupleSize },
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^1H\n##PEAK TABLE= (XY..XY)\n1.0 2.0 3.0\n##END=", 4, 9, "1.0 2.0 3.0", JcampMessages.ExpectedTupleSize },
        { "##TITLE= t\n##.OBSERVE NUCLEUS= ^13C\n##PEAK ASSIGNMENTS= (XYA)\n46.25, 50.0, CH2\n##END=", 4, 1, "46.25, 50.0, CH2", JcampMessages.ExpectedAssignmentTuple },
    };

    [Theory]
    [MemberData(nameof(BadInputs))]
    public void Read_MalformedFile_ReportsLineColumnAndExpectation(string text, int line, int column, string fragment, string expected)
    {
        var result = JcampReader.Read(text);
        Assert.False(result.Succeeded);
        var problem = Assert.Single(result.Problems, p => p.Severity == ProblemSeverity.Error);
        Assert.Equal((line, column, fragment, expected), (problem.Line, problem.Column, problem.Fragment, problem.Expected));
        Assert.Equal(JcampMessages.Describe(line, column, fragment, expected), problem.Message);
    }

    [Fact]
    public void Read_FullSpectrumBlock_WarnsThatOnlyPeakTablesAreRead()
    {
        var result = JcampReader.Read("##TITLE= t\n##XYDATA= (X++(Y..Y))\n1 2 3\n##END=");
        Assert.True(result.Succeeded);
        Assert.Equal(JcampMessages.ExpectedPeakTable, Assert.Single(result.Problems).Expected);
        Assert.Empty(result.Spectra);
    }

    [Fact]
    public void Read_UnknownNucleus_Warns()
    {
        var result = JcampReader.Read("##TITLE= t\n##.OBSERVE NUCLEUS= ^15N\n##PEAK TABLE= (XY..XY)\n1.0, 2.0\n##END=");
        Assert.True(result.Succeeded);
        var problem = Assert.Single(result.Problems);
        Assert.Equal((2, JcampMessages.ExpectedNucleus), (problem.Line, problem.Expected));
    }

    [Fact]
    public void Read_MissingNucleus_WarnsOnTheTitleLine()
    {
        var result = JcampReader.Read("\n##TITLE= t\n##PEAK TABLE= (XY..XY)\n1.0, 2.0\n##END=");
        var problem = Assert.Single(result.Problems);
        Assert.Equal((2, JcampMessages.ExpectedNucleus, ProblemSeverity.Warning), (problem.Line, problem.Expected, problem.Severity));
    }
}
