using System.Diagnostics;
using ConsistencyHost.LoadGenerator.Target;
using Grpc.Core;

namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>
/// A closed loop: K workers, each making its next call as soon as the previous one returns, so K calls are in
/// flight at all times. Measures capacity at that concurrency (not latency at a given arrival rate: see
/// <see cref="OpenLoop"/>).
/// </summary>
public static class ClosedLoop
{
    /// <summary>Runs for a fixed time; calls still in flight at the end finish and count.</summary>
    public static Task<PhaseResult> ForDurationAsync(CallKind kind, int concurrency, TimeSpan duration) =>
        RunAsync(kind, concurrency, (_, started) => Stopwatch.GetElapsedTime(started) < duration);

    /// <summary>Runs until a fixed number of calls has been made.</summary>
    public static Task<PhaseResult> ForCallsAsync(CallKind kind, int concurrency, long calls)
    {
        var issued = 0L;
        return RunAsync(kind, concurrency, (_, _) => Interlocked.Increment(ref issued) <= calls);
    }

    private static async Task<PhaseResult> RunAsync(CallKind kind, int concurrency, Func<int, long, bool> another)
    {
        var log = new CallLog();
        var next = -1L;
        var started = Stopwatch.GetTimestamp();
        var workers = Enumerable.Range(0, concurrency).Select(worker => Task.Run(async () =>
        {
            while (another(worker, started))
            {
                await OneAsync(kind, Interlocked.Increment(ref next), log);
            }
        }));
        await Task.WhenAll(workers);
        return new PhaseResult(kind.Name, log, Stopwatch.GetElapsedTime(started));
    }

    /// <summary>Makes call i and records how it went.</summary>
    internal static async Task OneAsync(CallKind kind, long i, CallLog log, long? scheduledTimestamp = null)
    {
        var started = scheduledTimestamp ?? Stopwatch.GetTimestamp();
        try
        {
            var wrong = await kind.Invoke(i, CancellationToken.None);
            if (wrong is null) log.Success(Stopwatch.GetElapsedTime(started).TotalMilliseconds);
            else log.Failure("WRONG_REPLY", wrong);
        }
        catch (RpcException error)
        {
            log.Failure(error);
        }
    }
}
