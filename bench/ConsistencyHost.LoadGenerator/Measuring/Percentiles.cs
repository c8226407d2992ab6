namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>Percentiles of latency samples by the nearest-rank method.</summary>
/// <remarks>
/// Nearest rank (common practice for latency reports): the p-th percentile of N sorted samples is the sample at
/// 1-based rank ⌈p/100 · N⌉, so it is always an observed value and never interpolated; p = 0 gives the minimum.
/// </remarks>
public static class Percentiles
{
    /// <summary>The p-th percentile (0–100) of samples that are already sorted ascending.</summary>
    /// <exception cref="ArgumentOutOfRangeException">p outside 0–100.</exception>
    /// <exception cref="ArgumentException">No samples.</exception>
    public static double NearestRank(IReadOnlyList<double> sorted, double p)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(p, 0);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(p, 100);
        if (sorted.Count == 0) throw new ArgumentException("no samples to take a percentile of", nameof(sorted));
        var rank = (int)Math.Ceiling(p / 100.0 * sorted.Count);
        return sorted[Math.Max(rank, 1) - 1];
    }

    /// <summary>The median of unsorted values (nearest rank, so an observed value); NaN when there are none.</summary>
    public static double Median(IEnumerable<double> values)
    {
        var sorted = values.Order().ToArray();
        return sorted.Length == 0 ? double.NaN : NearestRank(sorted, 50);
    }
}
