using ConsistencyHost.LoadGenerator.CommandLine;
using ConsistencyHost.LoadGenerator.Entries;
using ConsistencyHost.LoadGenerator.Measuring;
using ConsistencyHost.LoadGenerator.Target;

namespace ConsistencyHost.LoadGenerator.Modes;

/// <summary>
/// <c>soak</c>: CheckEntry at a fixed arrival rate for a long time while the server's memory is sampled, to show
/// that memory stays flat (no leak per call) and latency does not drift.
/// </summary>
public static class SoakMode
{
    /// <summary>Options this mode takes.</summary>
    public static readonly string[] Options = ["--target", "--rate", "--duration", "--server-pid", "--sample-every", "--max-in-flight", "--warmup", "--call-timeout", "--out", "--csv"];

    /// <summary>Runs the soak.</summary>
    public static async Task<ModeOutcome> RunAsync(Arguments args)
    {
        var target = args.Address("--target");
        var rate = args.Rate("--rate");
        var duration = args.Duration("--duration", TimeSpan.FromMinutes(10));
        var pids = args.Pids("--server-pid");
        if (pids.Count != 1) throw new UsageException("--server-pid: give the host's process id (one), so that its memory can be sampled");
        var every = args.Duration("--sample-every", TimeSpan.FromSeconds(5));
        var maxInFlight = args.Int("--max-in-flight", 1000);
        var warmup = args.Duration("--warmup", TimeSpan.FromSeconds(5));
        CallKind.CallTimeout = args.Duration("--call-timeout", CallKind.CallTimeout);

        var machine = MachineNote.Now();
        using var channel = Channels.To(target);
        var log = new CallLog();
        var check = CallKind.Check(channel, Workload.FromEntryMix());
        var loop = new OpenLoop(check, rate, maxInFlight);
        var sampler = new MemorySampler(new ProcessProbe(pids[0]), channel, every);
        using var died = new CancellationTokenSource();
        using var done = new CancellationTokenSource();

        var sampling = sampler.RunAsync(() => log.Succeeded + log.Failed, died, done.Token);
        // Memory is sampled from start-up on; latency only after a warm-up (one call at a time: JIT, first GC).
        var warm = await ClosedLoop.ForDurationAsync(check, 1, warmup);
        var result = await loop.RunAsync(duration, log, died.Token);
        await done.CancelAsync();
        await sampling;

        if (args.Value("--csv") is { } csv) await File.WriteAllTextAsync(csv, MemoryCurve.Csv(sampler.Samples));
        var figures = CallFigures.Of(result);
        var summary = new SoakSummary(
            "soak", target.ToString(), rate, duration.TotalSeconds, CallFigures.Round(result.Elapsed.TotalSeconds), machine, MachineNote.LoadAverage(),
            loop.Sent, loop.Lost, figures, sampler.Samples.Count,
            MemoryCurve.Of(sampler.Samples, s => s.ResidentBytes), MemoryCurve.Of(sampler.Samples, s => s.ManagedHeapBytes),
            sampler.Samples.LastOrDefault()?.Gen2Collections, warm.Log.Failed, !sampler.ServerDied, [.. warm.Log.Messages.Concat(log.Messages)]);
        return new ModeOutcome(summary, figures.Errors + warm.Log.Failed == 0 && loop.Lost == 0 && !sampler.ServerDied);
    }
}

/// <summary>The JSON summary of <c>soak</c> (field names are stable; scripts read them).</summary>
public sealed record SoakSummary(
    string Mode, string Target, double RatePerSecond, double DurationSeconds, double ElapsedSeconds, MachineNote Machine, double? LoadAverage1mAtEnd,
    long Sent, long Lost, CallFigures Check, int MemorySamples, MemoryCurve? Resident, MemoryCurve? ManagedHeap, int? Gen2Collections,
    int WarmupErrors, bool ServerAlive, IReadOnlyList<string> ErrorMessages);
