using System.Diagnostics;
using ConsistencyHost.LoadGenerator.Target;

namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>
/// An open loop: calls start at a fixed arrival rate whether or not earlier ones have returned, as an ELN's saves
/// arrive. Latency runs from each call's scheduled start, so a stalled server shows as latency rather than as
/// fewer calls (the "coordinated omission" a closed loop would hide). Calls that would exceed
/// <paramref name="maxInFlight"/> are not sent and count as lost.
/// </summary>
public sealed class OpenLoop(CallKind kind, double ratePerSecond, int maxInFlight)
{
    private int _inFlight;
    private long _lost;

    /// <summary>Calls not sent because too many were still waiting for a reply.</summary>
    public long Lost => Interlocked.Read(ref _lost);

    /// <summary>Calls sent so far (including those still in flight).</summary>
    public long Sent { get; private set; }

    /// <summary>Runs until <paramref name="duration"/> has passed or <paramref name="stop"/> fires, then waits for the calls in flight.</summary>
    public async Task<PhaseResult> RunAsync(TimeSpan duration, CallLog log, CancellationToken stop)
    {
        var started = Stopwatch.GetTimestamp();
        var pending = new List<Task>();
        while (!stop.IsCancellationRequested && Stopwatch.GetElapsedTime(started) < duration)
        {
            var due = (long)(Stopwatch.GetElapsedTime(started).TotalSeconds * ratePerSecond);
            for (; Sent < due; Sent++)
            {
                var scheduled = started + (long)(Sent / ratePerSecond * Stopwatch.Frequency);
                if (Interlocked.Increment(ref _inFlight) > maxInFlight)
                {
                    Interlocked.Decrement(ref _inFlight);
                    Interlocked.Increment(ref _lost);
                    continue;
                }

                pending.Add(SendAsync(Sent, scheduled, log));
            }

            pending.RemoveAll(t => t.IsCompleted);
            await Task.Delay(TimeSpan.FromMilliseconds(1), CancellationToken.None);
        }

        await Task.WhenAll(pending);
        return new PhaseResult(kind.Name, log, Stopwatch.GetElapsedTime(started));
    }

    private async Task SendAsync(long i, long scheduled, CallLog log)
    {
        try
        {
            await Task.Yield();
            await ClosedLoop.OneAsync(kind, i, log, scheduled);
        }
        finally
        {
            Interlocked.Decrement(ref _inFlight);
        }
    }
}
