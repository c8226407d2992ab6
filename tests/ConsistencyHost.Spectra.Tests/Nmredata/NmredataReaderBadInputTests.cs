using ConsistencyHost.Spectra.Nmredata;
using M = ConsistencyHost.Spectra.Nmredata.NmredataMessages;

namespace ConsistencyHost.Spectra.Tests.Nmredata;

/// <summary>Broken records: each row gives the tags after the MOL block, the line, fragment, expectation and severity.</summary>
public sealed class NmredataReaderBadInputTests
{
    // The MOL block has 25 lines (title to "M  END"), so the first tag header is on line 27 after one blank line.
    private static string Record(string tags) => NmredataFixtures.MolBlock + "\n\n" + tags + "\n\n$$$$\n";

    public static TheoryData<string, int, string, string, ProblemSeverity> Rows => new()
    {
        { ">  <NMREDATA_ASSIGNMENT>\nHa, 2.5800\\", 28, "Ha, 2.5800", M.ExpectedAssignmentLine, ProblemSeverity.Error },
        { ">  <NMREDATA_ASSIGNMENT>\nHa, two, H1\\", 28, "two", M.ExpectedShift, ProblemSeverity.Error },
        { ">  <NMREDATA_ASSIGNMENT>\nHa, 2.5800, H11\\", 28, "H11", M.ExpectedAtom, ProblemSeverity.Error },
        { ">  <NMREDATA_ASSIGNMENT>\nHa, 2.5800, X1\\", 28, "X1", M.ExpectedAtom, ProblemSeverity.Error },
        { ">  <NMREDATA_J>\nHa, Hb\\", 28, "Ha, Hb", M.ExpectedJLine, ProblemSeverity.Error },
        { ">  <NMREDATA_1D_1H>\nLarmor=400.13\\\nabc, S=s\\", 29, "abc", M.ExpectedShift, ProblemSeverity.Error },
        { ">  <NMREDATA_1D_1H>\nLarmor=400.13\\\n2.58, S=s, J=7.1(\\", 29, "7.1(", M.ExpectedCoupling, ProblemSeverity.Error },
        { ">  <NMREDATA_1D_1H>\nLarmor=400.13\\\n2.58, N=three\\", 29, "three", M.ExpectedNumber, ProblemSeverity.Error },
        { ">  <NMREDATA_1D_1H>\nLarmor=fast\\\n2.58, S=s\\", 28, "fast", M.ExpectedNumber, ProblemSeverity.Error },
        { ">  <NMREDATA_TEMPERATURE>\n25 C\\", 28, "25 C", M.ExpectedTemperature, ProblemSeverity.Error },
        { ">  <NMREDATA_1D_1H>\n2.58, S=s\\", 27, "NMREDATA_1D_1H", M.ExpectedLarmor, ProblemSeverity.Warning },
        { ">  <NMREDATA_1D_1H>\nLarmor=400.13\\\n2.58, S=s, Q=1\\", 29, "Q=1", M.ExpectedAttribute, ProblemSeverity.Warning },
        { ">  <NMREDATA_1D_1H>\nLarmor=400.13\\\n2.58, S=s, L=Hz\\", 29, "Hz", M.ExpectedKnownLabel, ProblemSeverity.Warning },
        { ">  <NMREDATA_1D_15N>\nLarmor=40.5\\\n120.0\\", 27, "NMREDATA_1D_15N", M.ExpectedKnownNucleus, ProblemSeverity.Warning },
        { ">  <NMREDATA_VERSION>\n1.1\\\n\n>  <NMREDATA_FORMULA>\nC8H7FO\nC8H7FO", 31, "C8H7FO", M.ExpectedBackslash, ProblemSeverity.Warning },
        { "stray line", 27, "stray line", M.ExpectedTagHeader, ProblemSeverity.Error },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_BrokenTag_ReportsLineFragmentAndExpectation(string tags, int line, string fragment, string expected, ProblemSeverity severity)
    {
        var result = NmredataReader.Read(Record(tags));
        var problem = Assert.Single(result.Problems);
        Assert.Equal((line, fragment, expected, severity), (problem.Line, problem.Fragment, problem.Expected, problem.Severity));
        Assert.Equal(M.Describe(line, fragment, expected), problem.Message);
        Assert.Equal(severity == ProblemSeverity.Warning, result.Succeeded);
    }

    [Fact]
    public void Read_RecordWithoutMolEnd_ReportsMissingMolBlock()
    {
        var result = NmredataReader.Read("title\n\n\n  1  0  0  0  0  0  0  0  0  0999 V2000\n$$$$\n");
        var problem = Assert.Single(result.Problems);
        Assert.Equal((1, "title", M.ExpectedMolEnd), (problem.Line, problem.Fragment, problem.Expected));
        Assert.Empty(result.Records);
    }

    [Fact]
    public void Read_DuplicateTag_WarnsAndKeepsTheFirst()
    {
        var result = NmredataReader.Read(Record(">  <NMREDATA_FORMULA>\nC8H7FO\\\n\n>  <NMREDATA_FORMULA>\nC9H9FO\\"));
        Assert.Equal(M.ExpectedUniqueTag, Assert.Single(result.Problems).Expected);
        Assert.Equal("C8H7FO", result.Records.Single().Formula);
    }
}
