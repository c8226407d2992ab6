using System.Globalization;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// A worker killed by another process (here the test, as a hostile neighbour would) in the middle of a run: the run
/// is reported as killed from outside, not as the plugin's crash, and the loss does not count toward quarantine.
/// </summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")] // workers and /proc
public sealed class ExternalKillTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    [Fact]
    public async Task CheckEntry_WorkerKilledFromOutsideDuringRun_IsReportedAsKilledAndNotCounted()
    {
        // One counted loss would quarantine the plugin; 20 s leaves the test ample time to see the rule spinning.
        using var config = await HostileConfig.WriteAsync("""
            { "ConsistencyHost": { "RuleDeadlineMs": 20000, "Isolation": { "CrashLimit": 1, "CrashWindowMinutes": 60 } } }
            """);
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.LoopingRule"], config.Path);
        var client = new EntryCheck.EntryCheckClient(host.Channel);
        var worker = Assert.Single(WorkerProcesses.Running(host.PluginsPath));

        var call = client.CheckEntryAsync(Requests.MissingSolvent("KILL-1"), deadline: DateTime.UtcNow + CallTimeout);
        await SpinningAsync(worker);
        using (var victim = System.Diagnostics.Process.GetProcessById(worker)) victim.Kill();
        var killed = await call;
        var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
        var next = await client.CheckEntryAsync(Requests.Complete("KILL-2"), deadline: DateTime.UtcNow + CallTimeout);

        var run = Assert.Single(killed.RuleRuns, r => r.RuleId == "fixture-loops");
        Assert.Equal(RuleRunStatus.Crashed, run.Status);
        Assert.Contains("killed by signal 9 (SIGKILL) from outside the worker", run.Message, StringComparison.Ordinal);
        Assert.Contains("not counted against the plugin", run.Message, StringComparison.Ordinal);
        Assert.Equal("solvent-not-stated", Assert.Single(killed.Findings).Code);
        // Not quarantined with a crash limit of 1: the kill was not counted. The next entry runs the rule in a new
        // worker (it overruns again, as it always does) and the built-in rule answers correctly.
        Assert.Equal(RuleLoadStatus.Loaded, Assert.Single(rules.Rules, r => r.Id == "fixture-loops").LoadStatus);
        Assert.Equal(RuleRunStatus.TimedOut, Assert.Single(next.RuleRuns, r => r.RuleId == "fixture-loops").Status);
        Assert.Empty(next.Findings);
    }

    /// <summary>Waits until the worker has used a second of CPU beyond what it had: the rule's loop is running.</summary>
    private static async Task SpinningAsync(int pid)
    {
        var start = CpuTicks(pid);
        using var give = new CancellationTokenSource(TimeSpan.FromSeconds(60));
        while (CpuTicks(pid) - start < 100)
        {
            await Task.Delay(100, give.Token);
        }
    }

    /// <summary>utime + stime from /proc/PID/stat (fields 14 and 15, in clock ticks of 1/100 s on Linux).</summary>
    private static long CpuTicks(int pid)
    {
        var stat = File.ReadAllText($"/proc/{pid}/stat");
        var fields = stat[(stat.LastIndexOf(')') + 2)..].Split(' ');
        return long.Parse(fields[11], CultureInfo.InvariantCulture) + long.Parse(fields[12], CultureInfo.InvariantCulture);
    }
}
