using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Vetting;

/// <summary>
/// The hostile plugins that passed the banned list (issue 14) are refused by all three vetting paths for the
/// API each uses, named, as not on the allow-list: the analyzers at build time, the host's IL scan of the
/// compiled plugin, and the host's source-plugin vetting.
/// </summary>
public sealed class HostileVettingTests
{
    public static TheoryData<string> Plugins() => [.. VettingFixtures.HostileApis.Keys];

    [Theory]
    [MemberData(nameof(Plugins))]
    public void Analyzers_HostilePlugin_ReportEachApiAsNotAllowed(string plugin)
    {
        var messages = VettingCorpus.AnalyzerDiagnostics(plugin)
            .Where(d => d.Id == VettingFixtures.HostileCode).Select(d => d.GetMessage()).ToList();

        Assert.All(VettingFixtures.HostileApis[plugin], api => Assert.Contains(messages, m => m.Contains(api, StringComparison.Ordinal)));
    }

    [Theory]
    [MemberData(nameof(Plugins))]
    public void CompiledVetting_HostilePlugin_RefusesNamingEachApi(string plugin)
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropCompiled(folder.Path, plugin, VettingCorpus.Emit(VettingCorpus.Compile(plugin)));

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache")));

        Assert.False(rule.IsLoaded);
        AssertNamesEveryApi(plugin, rule.LoadMessage);
    }

    [Theory]
    [MemberData(nameof(Plugins))]
    public void SourceVetting_HostilePlugin_RefusesNamingEachApi(string plugin)
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropSource(folder.Path, plugin);

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache")));

        Assert.False(rule.IsLoaded);
        AssertNamesEveryApi(plugin, rule.LoadMessage);
    }

    private static void AssertNamesEveryApi(string plugin, string? message)
    {
        Assert.NotNull(message);
        foreach (var api in VettingFixtures.HostileApis[plugin])
        {
            // Each refusal reads "CHSDK1002: {member} uses {api}, not on the allow-list …" (compiled) or
            // "CHSDK1002: '{api}' is not on the allow-list …" (source); the API and the code share one problem.
            Assert.True(message.Split("; ").Any(p => p.Contains(VettingFixtures.HostileCode + ": ", StringComparison.Ordinal) &&
                                                     p.Contains(api, StringComparison.Ordinal) && p.Contains("allow-list", StringComparison.Ordinal)),
                $"no {VettingFixtures.HostileCode} naming {api} in: {message}");
        }
    }
}
