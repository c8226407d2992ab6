using System.Diagnostics;

namespace ConsistencyHost.StreamBench.Streaming;

/// <summary>
/// Watches a running <c>consistencyhost batch</c> (and, with --server, its host): counts the lines of its
/// reports.jsonl as they are written and samples both processes' memory when the count passes a checkpoint.
/// Sampling is by polling, so a checkpoint is taken at most one poll after it is passed; VmHWM only grows, so
/// a late sample can only overstate that checkpoint's peak.
/// </summary>
internal sealed class ProcessWatch(int pid, int? serverPid, string progressFile, int entries)
{
    private static readonly TimeSpan Poll = TimeSpan.FromMilliseconds(100);

    public async Task<WatchResult> RunAsync()
    {
        var clock = Stopwatch.StartNew();
        var cli = new List<Checkpoint>();
        var host = new List<Checkpoint>();
        var lines = new LineCounter(progressFile);
        var next = 0;
        while (File.Exists($"/proc/{pid}/status"))
        {
            var done = lines.Count();
            var passed = Passed(next, done);
            if (passed > next && TrySample(pid, passed, clock, cli))
            {
                if (serverPid is { } server) TrySample(server, passed, clock, host);
                next = passed;
            }

            if (done >= entries) break;
            await Task.Delay(Poll);
        }

        return new WatchResult(entries, clock.Elapsed.TotalSeconds, cli, host);
    }

    /// <summary>The highest checkpoint at or below <paramref name="done"/> (or <paramref name="current"/>).</summary>
    private int Passed(int current, int done)
    {
        var best = current;
        for (var n = current + 1; n <= Math.Min(done, entries); n++)
        {
            if (Checkpoints.IsAt(n, entries)) best = n;
        }

        return best;
    }

    private static bool TrySample(int process, int passed, Stopwatch clock, List<Checkpoint> into)
    {
        try
        {
            var memory = ProcMemory.Of(process);
            into.Add(new Checkpoint(passed, clock.Elapsed.TotalSeconds, memory.RssKiB, memory.PeakKiB));
            return true;
        }
        catch (IOException)
        {
            return false; // the process ended between the check and the read
        }
    }
}

/// <summary>A watched batch: checkpoints of the CLI process and, with --server, of the host.</summary>
internal sealed record WatchResult(int Entries, double Seconds, IReadOnlyList<Checkpoint> Cli, IReadOnlyList<Checkpoint> Host);
