using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Server.Tests.EndToEnd;

public sealed class HostilePluginTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);

    [Fact]
    public async Task CheckEntry_ThrowingAndLoopingPlugins_AreRunStatusesAndHostKeepsServing()
    {
        var config = Path.Combine(Path.GetTempPath(), $"ch-config-{Guid.NewGuid():N}.json");
        // Only the runaway fixture gets a short deadline; the well-behaved rule keeps the default.
        await File.WriteAllTextAsync(config, """
            { "ConsistencyHost": { "Profiles": { "default": { "Rules": { "fixture-loops": { "DeadlineMs": 300 } } } } } }
            """);
        try
        {
            await using var host = await RunningHost.StartAsync(
                ["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.ThrowingRule", "ConsistencyHost.Fixtures.LoopingRule"], config);
            var client = new EntryCheck.EntryCheckClient(host.Channel);

            var first = await client.CheckEntryAsync(Requests.MissingSolvent("H-1"), deadline: DateTime.UtcNow + CallTimeout);
            var second = await client.CheckEntryAsync(Requests.MissingSolvent("H-2"), deadline: DateTime.UtcNow + CallTimeout);

            Assert.Equal(RuleRunStatus.Failed, first.RuleRuns.Single(r => r.RuleId == "fixture-throws").Status);
            Assert.Equal(RuleRunStatus.TimedOut, first.RuleRuns.Single(r => r.RuleId == "fixture-loops").Status);
            Assert.Equal("solvent-not-stated", Assert.Single(first.Findings).Code);
            Assert.Equal("solvent-not-stated", Assert.Single(second.Findings).Code);
            Assert.Equal(RuleRunStatus.Ok, second.RuleRuns.Single(r => r.RuleId == "spectrum-metadata").Status);
        }
        finally
        {
            File.Delete(config);
        }
    }
}
