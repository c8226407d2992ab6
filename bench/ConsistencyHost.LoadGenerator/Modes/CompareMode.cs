using ConsistencyHost.LoadGenerator.CommandLine;
using ConsistencyHost.LoadGenerator.Entries;
using ConsistencyHost.LoadGenerator.Measuring;
using ConsistencyHost.LoadGenerator.Target;

namespace ConsistencyHost.LoadGenerator.Modes;

/// <summary>
/// <c>compare</c>: Echo against CheckEntry on the same host in one run, in alternating phases (echo, check, echo,
/// check …) so that both see the same machine load; throughput is the median over each kind's phases.
/// </summary>
public static class CompareMode
{
    /// <summary>The targets: check throughput at least a quarter of echo's (stretch: half), p99 under 10 ms.</summary>
    public static readonly CompareTargets Targets = new(0.25, 0.5, 10);

    /// <summary>Options this mode takes.</summary>
    public static readonly string[] Options = ["--target", "--concurrency", "--duration", "--phases", "--warmup", "--server-pid", "--call-timeout", "--out"];

    /// <summary>Runs the comparison.</summary>
    public static async Task<ModeOutcome> RunAsync(Arguments args)
    {
        var target = args.Address("--target");
        var concurrency = args.Int("--concurrency", 8);
        var duration = args.Duration("--duration", TimeSpan.FromSeconds(30));
        var phases = args.Int("--phases", 6, min: 2);
        if (phases % 2 != 0) throw new UsageException($"--phases: {phases} is odd; echo and check phases alternate, so give an even number");
        var warmup = args.Duration("--warmup", TimeSpan.FromSeconds(3));
        var server = args.Pids("--server-pid").Select(p => new ProcessProbe(p)).SingleOrDefault();
        CallKind.CallTimeout = args.Duration("--call-timeout", CallKind.CallTimeout);

        var machine = MachineNote.Now();
        var workload = Workload.FromEntryMix();
        using var channel = Channels.To(target);
        CallKind[] kinds = [CallKind.Echo(channel, workload), CallKind.Check(channel, workload)];
        var phaseLength = duration / phases;

        // Warm-up (JIT, tiered compilation, connection): counted for errors, not for figures.
        var warm = new List<PhaseResult>();
        foreach (var kind in kinds) warm.Add(await ClosedLoop.ForDurationAsync(kind, concurrency, warmup));

        // The host's rule timings are collected over the measured phases only.
        var times = new ServerTimes();
        kinds[1] = CallKind.Check(channel, workload, times);
        var results = new List<PhaseResult>();
        var cpuMs = new List<double?>();
        for (var i = 0; i < phases; i++)
        {
            var cpuBefore = server?.CpuSeconds();
            results.Add(await ClosedLoop.ForDurationAsync(kinds[i % 2], concurrency, phaseLength));
            cpuMs.Add(server?.CpuSeconds() - cpuBefore is { } spent && results[^1].Log.Succeeded > 0 ? CallFigures.Round(spent * 1000 / results[^1].Log.Succeeded) : null);
        }

        var echo = CallFigures.Of(results.Where(r => r.Kind == "echo").ToList());
        var check = CallFigures.Of(results.Where(r => r.Kind == "check").ToList());
        var ratio = echo.CallsPerSecond > 0 ? CallFigures.Round(check.CallsPerSecond / echo.CallsPerSecond) : 0;
        var warmErrors = warm.Sum(w => w.Log.Failed);
        var alive = server?.IsAlive ?? true;
        var summary = new CompareSummary(
            "compare", target.ToString(), concurrency, duration.TotalSeconds, phaseLength.TotalSeconds, machine, MachineNote.LoadAverage(),
            CallFigures.Round(workload.MeanCheckRequestBytes), CallFigures.Round(workload.MeanEchoRequestBytes),
            echo, check, ratio, times.Figures(), Targets,
            ratio >= Targets.MinCheckToEchoRatio, ratio >= Targets.StretchCheckToEchoRatio, check.P99Ms < Targets.MaxP99Ms,
            HostCpuMs(results, cpuMs, "echo"), HostCpuMs(results, cpuMs, "check"),
            [.. results.Select((r, i) => new PhaseFigures(i, r.Kind, CallFigures.Round(r.Elapsed.TotalSeconds), CallFigures.Of(r), cpuMs[i]))],
            warmErrors, alive,
            [.. warm.Concat(results).SelectMany(r => r.Log.Messages).Distinct().Take(10)]);
        return new ModeOutcome(summary, echo.Errors + check.Errors + warmErrors == 0 && alive);
    }

    // Median over the phases of one kind; null without a server pid.
    private static double? HostCpuMs(List<PhaseResult> results, List<double?> cpuMs, string kind)
    {
        var values = results.Select((r, i) => (r.Kind, Ms: cpuMs[i])).Where(p => p.Kind == kind && p.Ms is not null).Select(p => p.Ms!.Value).ToList();
        return values.Count == 0 ? null : Percentiles.Median(values);
    }
}

/// <summary>The targets a comparison is held to (reported, not enforced by the exit code).</summary>
/// <param name="MinCheckToEchoRatio">Check throughput as a fraction of echo throughput, at least.</param>
/// <param name="StretchCheckToEchoRatio">The stretch goal for that fraction.</param>
/// <param name="MaxP99Ms">Check p99 latency below this, ms.</param>
public sealed record CompareTargets(double MinCheckToEchoRatio, double StretchCheckToEchoRatio, double MaxP99Ms);

/// <summary>One phase of a comparison.</summary>
/// <param name="Index">0-based position in the run.</param>
/// <param name="Kind">"echo" or "check".</param>
/// <param name="Seconds">Wall time of the phase.</param>
/// <param name="Figures">Its calls.</param>
/// <param name="HostCpuMsPerCall">The host's CPU time (user + system) per successful call in this phase, ms; null without --server-pid.</param>
public sealed record PhaseFigures(int Index, string Kind, double Seconds, CallFigures Figures, double? HostCpuMsPerCall);

/// <summary>The JSON summary of <c>compare</c> (field names are stable; scripts read them).</summary>
public sealed record CompareSummary(
    string Mode, string Target, int Concurrency, double DurationSeconds, double PhaseSeconds, MachineNote Machine, double? LoadAverage1mAtEnd,
    double CheckRequestBytes, double EchoRequestBytes, CallFigures Echo, CallFigures Check, double CheckToEchoThroughputRatio,
    ServerTimeFigures CheckServerTimes,
    CompareTargets Targets, bool MeetsRatioTarget, bool MeetsStretchRatioTarget, bool MeetsP99Target,
    double? EchoHostCpuMsPerCall, double? CheckHostCpuMsPerCall,
    IReadOnlyList<PhaseFigures> Phases, int WarmupErrors, bool ServerAlive, IReadOnlyList<string> ErrorMessages);
