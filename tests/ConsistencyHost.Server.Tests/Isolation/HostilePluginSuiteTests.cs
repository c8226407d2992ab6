using System.Diagnostics;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// The hostile plugins run untrusted (in workers) beside a built-in rule in the real host. Each must end as a
/// rule-run status or a refusal while the host keeps answering, the built-in rule's findings come back, a
/// second entry is unaffected, host memory stays near its baseline, and no worker outlives the host.
/// </summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")] // workers rely on prlimit, unshare and setpriv
public sealed class HostilePluginSuiteTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    private static readonly string[] Plugins =
    [
        "ConsistencyHost.Rules.SpectrumMetadata",
        "ConsistencyHost.Fixtures.RecursingRule",
        "ConsistencyHost.Fixtures.AllocatingRule",
        "ConsistencyHost.Fixtures.ExitingRule",
        "ConsistencyHost.Fixtures.ThreadingRule",
        "ConsistencyHost.Fixtures.ReflectiveFileRule",
        "ConsistencyHost.Fixtures.ReflectiveSocketRule",
        "ConsistencyHost.Fixtures.UnseenReflectionRule",
    ];

    [Fact]
    public async Task CheckEntry_HostilePluginsInWorkers_EndAsRunStatusesAndHostStaysWhole()
    {
        // Generous deadlines: only misbehaviour, never a slow shared machine, may end a run.
        using var config = await HostileConfig.WriteAsync("""{ "ConsistencyHost": { "RuleDeadlineMs": 60000 } }""");
        string pluginsPath;
        await using (var host = await RunningHost.StartAsync(Plugins, config.Path))
        {
            pluginsPath = host.PluginsPath;
            var client = new EntryCheck.EntryCheckClient(host.Channel);
            var baseline = HostMemory();

            var first = await client.CheckEntryAsync(Requests.MissingSolvent("HP-1"), deadline: DateTime.UtcNow + CallTimeout);
            var second = await client.CheckEntryAsync(Requests.Complete("HP-2"), deadline: DateTime.UtcNow + CallTimeout);
            var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
            var after = HostMemory();

            AssertRunOutcomes(first);
            AssertRunOutcomes(second);
            AssertRefusals(rules);
            // The built-in rule still reports on each entry, and only on what each entry lacks.
            Assert.Equal("solvent-not-stated", Assert.Single(first.Findings).Code);
            Assert.Empty(second.Findings);
            // The allocations happened in workers: the host's managed heap stays near its baseline.
            Assert.True(after.Managed < baseline.Managed + 64L * 1024 * 1024, $"host managed heap grew from {baseline.Managed} to {after.Managed} bytes");
            Assert.True(after.WorkingSet < baseline.WorkingSet + 256L * 1024 * 1024, $"host working set grew from {baseline.WorkingSet} to {after.WorkingSet} bytes");
        }

        Assert.Empty(WorkerProcesses.Running(pluginsPath));
    }

    private static void AssertRunOutcomes(CheckEntryResponse response)
    {
        var runs = response.RuleRuns.ToDictionary(r => r.RuleId);
        Assert.Equal(RuleRunStatus.Ok, runs["spectrum-metadata"].Status);

        Assert.Equal(RuleRunStatus.Crashed, runs["fixture-recurses"].Status);
        Assert.Contains("Stack overflow", runs["fixture-recurses"].Message, StringComparison.Ordinal);

        // The worker's managed heap limit (DOTNET_GCHeapHardLimit) turns runaway allocation into an exception.
        Assert.Equal(RuleRunStatus.Failed, runs["fixture-allocates"].Status);
        Assert.Contains(nameof(OutOfMemoryException), runs["fixture-allocates"].Message, StringComparison.Ordinal);

        Assert.DoesNotContain(response.Findings, f => f.Code is "read-succeeded" or "connected" or "unreachable");
        Assert.False(runs.ContainsKey("fixture-unseen-file"));
        Assert.False(runs.ContainsKey("fixture-unseen-socket"));
        Assert.False(runs.ContainsKey("fixture-exits"));
        Assert.False(runs.ContainsKey("fixture-starts-threads"));
        Assert.False(runs.ContainsKey("fixture-reflective-file"));
        Assert.False(runs.ContainsKey("fixture-reflective-socket"));
    }

    private static void AssertRefusals(ListRulesResponse rules)
    {
        var exits = Assert.Single(rules.Rules, r => r.Plugin == "ConsistencyHost.Fixtures.ExitingRule.dll");
        Assert.Equal(RuleLoadStatus.Refused, exits.LoadStatus);
        Assert.Contains("System.Environment.Exit", exits.LoadMessage, StringComparison.Ordinal);

        var threads = Assert.Single(rules.Rules, r => r.Plugin == "ConsistencyHost.Fixtures.ThreadingRule.dll");
        Assert.Equal(RuleLoadStatus.Refused, threads.LoadStatus);
        Assert.Contains("System.Threading.Thread", threads.LoadMessage, StringComparison.Ordinal);

        // Reflection by name is on the banned list: both reflective fixtures are refused before anything of them runs.
        var file = Assert.Single(rules.Rules, r => r.Plugin == "ConsistencyHost.Fixtures.ReflectiveFileRule.dll");
        Assert.Equal(RuleLoadStatus.Refused, file.LoadStatus);
        Assert.Contains("CHSDK1001", file.LoadMessage, StringComparison.Ordinal);
        Assert.Contains("System.Reflection.Assembly.GetType", file.LoadMessage, StringComparison.Ordinal);
        var socket = Assert.Single(rules.Rules, r => r.Plugin == "ConsistencyHost.Fixtures.ReflectiveSocketRule.dll");
        Assert.Equal(RuleLoadStatus.Refused, socket.LoadStatus);
        Assert.Contains("CHSDK1001", socket.LoadMessage, StringComparison.Ordinal);
        Assert.Contains("System.Type.GetType", socket.LoadMessage, StringComparison.Ordinal);

        // Expression trees over enumerated types slipped past the banned list; reflection and expression trees are off the allow-list.
        var unseen = Assert.Single(rules.Rules, r => r.Plugin == "ConsistencyHost.Fixtures.UnseenReflectionRule.dll");
        Assert.Equal(RuleLoadStatus.Refused, unseen.LoadStatus);
        Assert.Contains("CHSDK1002", unseen.LoadMessage, StringComparison.Ordinal);
        Assert.Contains("System.Linq.Expressions.Expression.Call", unseen.LoadMessage, StringComparison.Ordinal);

        Assert.Equal("in-process", Assert.Single(rules.Rules, r => r.Id == "spectrum-metadata").Isolation);
        Assert.Equal("worker", Assert.Single(rules.Rules, r => r.Id == "fixture-recurses").Isolation);
    }

    private static (long Managed, long WorkingSet) HostMemory()
    {
        var managed = GC.GetTotalMemory(forceFullCollection: true);
        using var self = Process.GetCurrentProcess();
        return (managed, self.WorkingSet64);
    }
}
