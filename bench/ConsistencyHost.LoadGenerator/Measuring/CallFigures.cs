namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>The figures reported for a set of calls (one phase, or one kind of call over all its phases).</summary>
/// <param name="Calls">Successful calls.</param>
/// <param name="CallsPerSecond">Successful calls per second (over several phases: the median of the phases).</param>
/// <param name="P50Ms">Median latency, ms (nearest rank).</param>
/// <param name="P99Ms">99th percentile latency, ms (nearest rank).</param>
/// <param name="MaxMs">Slowest call, ms.</param>
/// <param name="Errors">Failed calls.</param>
/// <param name="ErrorsByKind">Failed calls by gRPC status or WRONG_REPLY.</param>
public sealed record CallFigures(
    int Calls, double CallsPerSecond, double P50Ms, double P99Ms, double MaxMs, int Errors, IReadOnlyDictionary<string, int> ErrorsByKind)
{
    /// <summary>The figures of one phase.</summary>
    public static CallFigures Of(PhaseResult phase) => Of([phase]);

    /// <summary>The figures over several phases of one kind: latencies pooled, throughput the median of the phases.</summary>
    public static CallFigures Of(IReadOnlyList<PhaseResult> phases)
    {
        var latency = LatencySummary.Of(phases.SelectMany(p => p.Log.LatenciesMs));
        var errors = phases.SelectMany(p => p.Log.ErrorsByKind)
            .GroupBy(e => e.Key, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => g.Sum(e => e.Value), StringComparer.Ordinal);
        return new CallFigures(latency.Calls, Round(Percentiles.Median(phases.Select(p => p.CallsPerSecond))),
            Round(latency.P50Ms), Round(latency.P99Ms), Round(latency.MaxMs), errors.Values.Sum(), errors);
    }

    /// <summary>Three decimals: enough for milliseconds and calls per second, short in JSON.</summary>
    public static double Round(double value) => double.IsFinite(value) ? Math.Round(value, 3) : 0;
}
