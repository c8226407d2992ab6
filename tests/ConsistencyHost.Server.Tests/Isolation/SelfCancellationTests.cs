using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>A rule in a worker that throws its own OperationCanceledException long before its deadline.</summary>
public sealed class SelfCancellationTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    [Fact]
    public async Task CheckEntry_RuleThrowsItsOwnCancellationInWorker_IsFailedNotTimedOut()
    {
        using var config = await HostileConfig.WriteAsync("""{ "ConsistencyHost": { "RuleDeadlineMs": 60000 } }""");
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.CancellingRule"], config.Path);
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var first = await client.CheckEntryAsync(Requests.MissingSolvent("OCE-1"), deadline: DateTime.UtcNow + CallTimeout);
        var second = await client.CheckEntryAsync(Requests.Complete("OCE-2"), deadline: DateTime.UtcNow + CallTimeout);

        foreach (var reply in new[] { first, second })
        {
            var run = Assert.Single(reply.RuleRuns, r => r.RuleId == "fixture-cancels-itself");
            Assert.Equal(RuleRunStatus.Failed, run.Status);
            Assert.Equal("OperationCanceledException: the rule cancelled itself on purpose", run.Message);
        }

        Assert.Equal("solvent-not-stated", Assert.Single(first.Findings).Code);
        Assert.Empty(second.Findings);
    }
}
