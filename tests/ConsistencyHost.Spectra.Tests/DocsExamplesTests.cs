using System.Reflection;
using ConsistencyHost.Spectra.Jcamp;
using ConsistencyHost.Spectra.Nmredata;
using ConsistencyHost.Spectra.Reported;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Tests;

/// <summary>docs/spectra.md stays true: its examples read without problems and it lists every message.</summary>
public sealed class DocsExamplesTests
{
    private static readonly string Docs = File.ReadAllText(FindDocs());

    private static string FindDocs()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var path = Path.Combine(dir.FullName, "docs", "spectra.md");
            if (File.Exists(path)) return path;
        }
        throw new FileNotFoundException("docs/spectra.md not found above the test output directory.");
    }

    public static TheoryData<string> ReportedExamples()
    {
        var data = new TheoryData<string>();
        foreach (var block in Docs.Split("```reported\n").Skip(1)) data.Add(block[..block.IndexOf("```", StringComparison.Ordinal)].Trim());
        return data;
    }

    [Theory]
    [MemberData(nameof(ReportedExamples))]
    public void Read_DocsExample_ReadsWithoutProblems(string text)
    {
        var result = ReportedTextReader.Read(text);
        Assert.Empty(result.Problems);
        Assert.NotEmpty(result.Spectra);
    }

    [Theory]
    [InlineData(typeof(ReportedTextMessages))]
    [InlineData(typeof(JcampMessages))]
    [InlineData(typeof(NmredataMessages))]
    public void Docs_MessageClass_ListsEveryExpectation(Type messages)
    {
        var constants = messages.GetFields(BindingFlags.Public | BindingFlags.Static).Where(f => f.IsLiteral).ToList();
        Assert.NotEmpty(constants);
        Assert.All(constants, f => Assert.Contains((string)f.GetRawConstantValue()!, Docs));
    }

    [Fact]
    public void Docs_QuickStartSnippet_FindsResidualChloroform()
    {
        var result = ReportedTextReader.Read("1H NMR (400 MHz, CDCl3) δ 7.26 (s, 1H), 2.05 (s, 3H).");
        Assert.True(result.Succeeded);
        var matches = new ResidualMatcher().Match(result.Spectra[0]);   // 7.26 → residual CHCl3
        // Source: Gottlieb 1997 Table 1, CHCl3 in CDCl3 at 7.26.
        Assert.Contains(matches.Matches, m => m.SignalIndex == 0 && m.Kind == ResidualMatchKind.ResidualSolvent);
        Assert.Contains("var matches = new ResidualMatcher().Match(result.Spectra[0]);", Docs);
    }

    [Fact]
    public void Docs_ExampleCount_IsFour() => Assert.Equal(4, ReportedExamples().Count);
}
