namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>Latency of completed calls, milliseconds (nearest-rank percentiles).</summary>
/// <param name="Calls">Completed calls (successful or not) the figures are taken over.</param>
/// <param name="P50Ms">Median latency.</param>
/// <param name="P99Ms">99th percentile latency.</param>
/// <param name="MaxMs">Slowest call.</param>
public sealed record LatencySummary(int Calls, double P50Ms, double P99Ms, double MaxMs)
{
    /// <summary>Summarises latencies in milliseconds (any order); all zero when there are none.</summary>
    public static LatencySummary Of(IEnumerable<double> latenciesMs)
    {
        var sorted = latenciesMs.Order().ToArray();
        return sorted.Length == 0
            ? new LatencySummary(0, 0, 0, 0)
            : new LatencySummary(sorted.Length, Percentiles.NearestRank(sorted, 50), Percentiles.NearestRank(sorted, 99), sorted[^1]);
    }
}
