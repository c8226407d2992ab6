namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>Ordinary least-squares slope of y over x, for memory growth per minute in a soak.</summary>
/// <remarks>Least squares (Legendre 1805, Gauss 1809): slope = Σ(x−x̄)(y−ȳ) / Σ(x−x̄)².</remarks>
public static class LinearTrend
{
    /// <summary>The slope; 0 when fewer than two points or all x are equal.</summary>
    public static double Slope(IReadOnlyList<(double X, double Y)> points)
    {
        if (points.Count < 2) return 0;
        var meanX = points.Average(p => p.X);
        var meanY = points.Average(p => p.Y);
        var covariance = points.Sum(p => (p.X - meanX) * (p.Y - meanY));
        var variance = points.Sum(p => (p.X - meanX) * (p.X - meanX));
        return variance == 0 ? 0 : covariance / variance;
    }
}
