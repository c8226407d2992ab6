using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// The hostile plugins that passed the banned list (issue 14, tests/fixtures/vetting/Hostile.*) dropped as source
/// plugins beside a built-in rule into the real host: each is refused at vetting, naming the API it uses as not on
/// the allow-list; none of them runs; the host serves, and the built-in rule's findings on the next entries are
/// exactly what each entry lacks.
/// </summary>
public sealed class AllowListVettingTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    [Fact]
    public async Task Start_HostilePluginsOffTheAllowList_AreRefusedNamingTheApiAndTheHostChecksCleanly()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], folderCreated: DropHostilePlugins);
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
        var first = await client.CheckEntryAsync(Requests.MissingSolvent("AL-1"), deadline: DateTime.UtcNow + CallTimeout);
        var second = await client.CheckEntryAsync(Requests.Complete("AL-2"), deadline: DateTime.UtcNow + CallTimeout);

        foreach (var (plugin, apis) in VettingFixtures.HostileApis)
        {
            var refused = Assert.Single(rules.Rules, r => r.Plugin == plugin + " (source)");
            Assert.Equal(RuleLoadStatus.Refused, refused.LoadStatus);
            Assert.All(apis, api => Assert.Contains(refused.LoadMessage.Split("; "), problem =>
                problem.Contains(VettingFixtures.HostileCode + ": ", StringComparison.Ordinal) && problem.Contains(api, StringComparison.Ordinal)));
        }

        // Only the built-in rule ran, and it reports exactly what each entry lacks.
        Assert.Equal("spectrum-metadata", Assert.Single(first.RuleRuns).RuleId);
        Assert.Equal(RuleRunStatus.Ok, first.RuleRuns[0].Status);
        Assert.Equal("solvent-not-stated", Assert.Single(first.Findings).Code);
        Assert.Equal(RuleRunStatus.Ok, Assert.Single(second.RuleRuns).Status);
        Assert.Empty(second.Findings);
    }

    private static void DropHostilePlugins(string pluginsPath)
    {
        foreach (var plugin in VettingFixtures.HostileApis.Keys)
        {
            PluginFolder.CopySourcePlugin(pluginsPath, VettingFixtures.Folder(plugin));
        }
    }
}
