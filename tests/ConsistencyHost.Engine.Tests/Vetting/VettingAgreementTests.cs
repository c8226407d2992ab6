using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Tests.Shared;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace ConsistencyHost.Engine.Tests.Vetting;

/// <summary>
/// Build-time analyzers, the host's metadata vetting of a compiled plugin and the host's source-plugin
/// vetting must agree on the corpus: the same plugins refused for the same API or state.
/// </summary>
public sealed class VettingAgreementTests
{
    public static TheoryData<string, string, string, string?> Refused() => new()
    {
        { "Vetting.ReadsFile", "CHSDK1001", "System.IO.File.ReadAllText", "ReadsFileRule.Check" },
        { "Vetting.ReadsClock", "CHSDK2001", "System.DateTime.Now", "ReadsClockRule.Check" },
        { "Vetting.SuppressedClock", "CHSDK2001", "System.DateTime.UtcNow", "SuppressedClockRule.Check" },
        { "Vetting.StaticCounter", "CHSDK2002", "StaticCounterRule.Runs", null },
        { "Vetting.NoMetadata", "CHSDK0001", "NoMetadataRule", null },
    };

    [Theory]
    [MemberData(nameof(Refused))]
    public void Analyzers_BadCorpusPlugin_ReportTheApi(string plugin, string code, string api, string? member)
    {
        var diagnostics = VettingCorpus.AnalyzerDiagnostics(plugin);

        var diagnostic = Assert.Single(diagnostics, d => d.Id == code);
        Assert.Contains(api, diagnostic.GetMessage());
        Assert.Equal(plugin == "Vetting.SuppressedClock", diagnostic.IsSuppressed);
        if (member is not null)
        {
            var node = diagnostic.Location.SourceTree!.GetRoot().FindNode(diagnostic.Location.SourceSpan);
            var type = node.FirstAncestorOrSelf<ClassDeclarationSyntax>()!.Identifier.Text;
            Assert.Equal(member, type + "." + node.FirstAncestorOrSelf<MethodDeclarationSyntax>()!.Identifier.Text);
        }
    }

    [Theory]
    [MemberData(nameof(Refused))]
    public void CompiledVetting_BadCorpusPlugin_RefusesNamingApiAndMember(string plugin, string code, string api, string? member)
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropCompiled(folder.Path, plugin, VettingCorpus.Emit(VettingCorpus.Compile(plugin)));

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache")));

        Assert.False(rule.IsLoaded);
        Assert.Contains(code, rule.LoadMessage);
        Assert.Contains(api, rule.LoadMessage);
        Assert.Contains(member ?? api, rule.LoadMessage);
    }

    [Theory]
    [MemberData(nameof(Refused))]
    public void SourceVetting_BadCorpusPlugin_RefusesNamingApi(string plugin, string code, string api, string? member)
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropSource(folder.Path, plugin);

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache")));

        Assert.False(rule.IsLoaded);
        Assert.Equal(plugin + " (source)", rule.Plugin);
        Assert.Equal(plugin, rule.Id);
        Assert.Contains(code, rule.LoadMessage);
        Assert.Contains(api, rule.LoadMessage);
        // Source vetting points at the file and line, e.g. "at ReadsFileRule.cs(10,23)".
        Assert.Contains($"at {(member ?? api).Split('.')[0]}.cs(", rule.LoadMessage);
    }

    [Fact]
    public void AllThree_GoodCorpusPlugin_Accept()
    {
        Assert.Empty(VettingCorpus.AnalyzerDiagnostics("Vetting.Good"));

        using var folder = PluginFolder.With();
        VettingCorpus.DropCompiled(folder.Path, "Vetting.Good", VettingCorpus.Emit(VettingCorpus.Compile("Vetting.Good")));
        using var sources = PluginFolder.With();
        VettingCorpus.DropSource(sources.Path, "Vetting.Good");

        var compiled = Assert.Single(PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache")));
        var source = Assert.Single(PluginDiscovery.Discover(sources.Path, Path.Combine(sources.Path, ".cache")));

        Assert.True(compiled.IsLoaded, compiled.LoadMessage);
        Assert.True(source.IsLoaded, source.LoadMessage);
        Assert.Equal("vetting-good", compiled.Id);
        Assert.Equal("vetting-good", source.Id);
    }
}
