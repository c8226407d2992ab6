using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;

namespace ConsistencyHost.Server.Tests.Isolation;

public sealed class QuarantineTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    [Fact]
    public async Task CheckEntry_PluginWhoseWorkerKeepsCrashing_IsQuarantinedAndListedWithReason()
    {
        using var config = await HostileConfig.WriteAsync("""
            { "ConsistencyHost": { "RuleDeadlineMs": 60000, "Isolation": { "CrashLimit": 2, "CrashWindowMinutes": 60 } } }
            """);
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.RecursingRule"], config.Path);
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var statuses = new List<RuleRunStatus>();
        for (var i = 1; i <= 3; i++)
        {
            var reply = await client.CheckEntryAsync(Requests.MissingSolvent($"Q-{i}"), deadline: DateTime.UtcNow + CallTimeout);
            statuses.Add(reply.RuleRuns.Single(r => r.RuleId == "fixture-recurses").Status);
            Assert.Equal("solvent-not-stated", Assert.Single(reply.Findings).Code);
        }

        var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);

        Assert.Equal([RuleRunStatus.Crashed, RuleRunStatus.Crashed, RuleRunStatus.Quarantined], statuses);
        var listed = Assert.Single(rules.Rules, r => r.Id == "fixture-recurses");
        Assert.Equal(RuleLoadStatus.Quarantined, listed.LoadStatus);
        Assert.Contains("quarantined until", listed.LoadMessage, StringComparison.Ordinal);
        Assert.Contains("Stack overflow", listed.LoadMessage, StringComparison.Ordinal);
        Assert.Equal(RuleLoadStatus.Loaded, Assert.Single(rules.Rules, r => r.Id == "spectrum-metadata").LoadStatus);
    }
}
