namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>The calls of one phase and how long the phase took.</summary>
/// <param name="Kind">"echo" or "check".</param>
/// <param name="Log">What happened to each call.</param>
/// <param name="Elapsed">Wall time from the first call to the last reply.</param>
public sealed record PhaseResult(string Kind, CallLog Log, TimeSpan Elapsed)
{
    /// <summary>Successful calls per second of wall time.</summary>
    public double CallsPerSecond => Log.Succeeded / Elapsed.TotalSeconds;

    /// <summary>The latency figures of the successful calls.</summary>
    public LatencySummary Latency => LatencySummary.Of(Log.LatenciesMs);
}
