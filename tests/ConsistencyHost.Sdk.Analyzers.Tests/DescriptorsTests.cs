using System.Reflection;
using ConsistencyHost.Tests.Shared;
using Microsoft.CodeAnalysis;

namespace ConsistencyHost.Sdk.Analyzers.Tests;

public sealed class DescriptorsTests
{
    public static TheoryData<string> Ids() => new(All().Select(d => d.Id));

    [Theory]
    [MemberData(nameof(Ids))]
    public void HelpLink_EveryDiagnostic_PointsAtItsPageInTheRepository(string id)
    {
        var descriptor = All().Single(d => d.Id == id);

        Assert.Equal($"docs/analyzers/{id}.md", descriptor.HelpLinkUri);
        var page = File.ReadAllText(Path.Combine(RepoPaths.Root, descriptor.HelpLinkUri));
        Assert.StartsWith($"# {id}: {descriptor.Title}", page);
    }

    [Theory]
    [MemberData(nameof(Ids))]
    public void ReleaseTracking_EveryDiagnostic_IsListedWithItsCategoryAndSeverity(string id)
    {
        var descriptor = All().Single(d => d.Id == id);
        var unshipped = File.ReadAllText(Path.Combine(RepoPaths.Root, "src", "ConsistencyHost.Sdk.Analyzers", "AnalyzerReleases.Unshipped.md"));

        Assert.Contains($"{id} | {descriptor.Category} | {descriptor.DefaultSeverity} |", unshipped);
    }

    [Fact]
    public void Ids_AllDiagnostics_AreUniqueAndUseTheOwnPrefix()
    {
        var ids = All().Select(d => d.Id).ToList();

        Assert.Equal(ids.Count, ids.Distinct().Count());
        Assert.All(ids, id => Assert.Matches("^CHSDK[0-9]{4}$", id));
    }

    private static IEnumerable<DiagnosticDescriptor> All() =>
        typeof(Descriptors).GetFields(BindingFlags.Public | BindingFlags.Static).Select(f => (DiagnosticDescriptor)f.GetValue(null)!);
}
