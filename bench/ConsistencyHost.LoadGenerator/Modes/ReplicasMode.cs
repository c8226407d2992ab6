using ConsistencyHost.LoadGenerator.CommandLine;
using ConsistencyHost.LoadGenerator.Entries;
using ConsistencyHost.LoadGenerator.Measuring;
using ConsistencyHost.LoadGenerator.Target;

namespace ConsistencyHost.LoadGenerator.Modes;

/// <summary>
/// <c>replicas</c>: the same number of CheckEntry calls through a client-side round-robin channel over the first
/// 1, 2, … n replicas, in one run. With the replicas' process ids it also reports the CPU each replica spent,
/// which shows that the balancer spread the calls and what a million entries cost in CPU time.
/// </summary>
public static class ReplicasMode
{
    /// <summary>Options this mode takes.</summary>
    public static readonly string[] Options = ["--targets", "--concurrency", "--entries", "--server-pids", "--call-timeout", "--out"];

    /// <summary>Runs 1 … n replicas.</summary>
    public static async Task<ModeOutcome> RunAsync(Arguments args)
    {
        var targets = args.Addresses("--targets");
        var concurrency = args.Int("--concurrency", 8);
        var entries = args.Int("--entries", 2000);
        var probes = args.Pids("--server-pids").Select(p => new ProcessProbe(p)).ToArray();
        if (probes.Length > 0 && probes.Length != targets.Count)
        {
            throw new UsageException($"--server-pids: {probes.Length} process ids for {targets.Count} targets; give one per target, in the same order");
        }

        CallKind.CallTimeout = args.Duration("--call-timeout", CallKind.CallTimeout);
        var machine = MachineNote.Now();
        var workload = Workload.FromEntryMix();
        var runs = new List<ReplicaRun>();
        for (var n = 1; n <= targets.Count; n++) runs.Add(await RunAsync(targets.Take(n).ToList(), probes, concurrency, entries, workload));

        var alive = probes.All(p => p.IsAlive);
        var single = runs[0].Figures.CallsPerSecond;
        var summary = new ReplicasSummary("replicas", [.. targets.Select(t => t.ToString())], concurrency, entries, machine, MachineNote.LoadAverage(),
            [.. runs.Select(r => r with { SpeedupOverOne = single > 0 ? CallFigures.Round(r.Figures.CallsPerSecond / single) : 0 })],
            alive, [.. runs.SelectMany(r => r.ErrorMessages).Distinct().Take(10)]);
        return new ModeOutcome(summary, alive && runs.All(r => r.Figures.Errors + r.WarmupErrors == 0));
    }

    private static async Task<ReplicaRun> RunAsync(List<Uri> replicas, ProcessProbe[] probes, int concurrency, int entries, Workload workload)
    {
        using var channel = Channels.RoundRobin(replicas);
        var check = CallKind.Check(channel, workload);
        // Warm-up: the balancer connects to every replica and each replica's JIT settles; not counted.
        var warm = await ClosedLoop.ForCallsAsync(check, concurrency, Math.Max(40, 10 * concurrency * replicas.Count));
        var cpuBefore = probes.Select(p => p.CpuSeconds() ?? 0).ToArray();
        var result = await ClosedLoop.ForCallsAsync(check, concurrency, entries);
        var cpu = probes.Select((p, i) => CallFigures.Round((p.CpuSeconds() ?? 0) - cpuBefore[i])).ToArray();
        var figures = CallFigures.Of(result);
        var perMillion = probes.Length > 0 && figures.Calls > 0 ? CallFigures.Round(cpu.Sum() / figures.Calls * 1_000_000) : (double?)null;
        return new ReplicaRun(replicas.Count, CallFigures.Round(result.Elapsed.TotalSeconds), figures, cpu, perMillion, 0,
            warm.Log.Failed, [.. warm.Log.Messages.Concat(result.Log.Messages)]);
    }
}

/// <summary>One run over the first <paramref name="Replicas"/> replicas.</summary>
/// <param name="Replicas">Replicas balanced over.</param>
/// <param name="Seconds">Wall time for the entries.</param>
/// <param name="Figures">The calls (throughput is entries per second).</param>
/// <param name="CpuSecondsByReplica">CPU time each replica (all given, in order) spent during the timed part; empty without pids.</param>
/// <param name="CpuSecondsPerMillionEntries">Summed replica CPU time per million entries; null without pids.</param>
/// <param name="SpeedupOverOne">Throughput relative to one replica.</param>
/// <param name="WarmupErrors">Failed calls during warm-up.</param>
/// <param name="ErrorMessages">The first few failures.</param>
public sealed record ReplicaRun(int Replicas, double Seconds, CallFigures Figures, IReadOnlyList<double> CpuSecondsByReplica,
    double? CpuSecondsPerMillionEntries, double SpeedupOverOne, int WarmupErrors, IReadOnlyList<string> ErrorMessages);

/// <summary>The JSON summary of <c>replicas</c> (field names are stable; scripts read them).</summary>
public sealed record ReplicasSummary(string Mode, IReadOnlyList<string> Targets, int Concurrency, int Entries, MachineNote Machine,
    double? LoadAverage1mAtEnd, IReadOnlyList<ReplicaRun> Runs, bool ServersAlive, IReadOnlyList<string> ErrorMessages);
