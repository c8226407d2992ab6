using System.Reflection;
using ConsistencyHost.Spectra.Jcamp;
using ConsistencyHost.Spectra.Nmredata;
using ConsistencyHost.Spectra.Reported;

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
    public void Docs_ExampleCount_IsThree() => Assert.Equal(3, ReportedExamples().Count);
}
