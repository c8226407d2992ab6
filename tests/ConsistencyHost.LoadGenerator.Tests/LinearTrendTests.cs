using ConsistencyHost.LoadGenerator.Measuring;

namespace ConsistencyHost.LoadGenerator.Tests;

public sealed class LinearTrendTests
{
    [Fact]
    public void Slope_PointsOnALine_IsItsGradient()
    {
        // y = 2x + 1 exactly: least squares returns the line's own gradient.
        Assert.Equal(2, LinearTrend.Slope([(0, 1), (1, 3), (2, 5), (3, 7)]), 12);
    }

    [Fact]
    public void Slope_ScatteredPoints_IsTheHandComputedLeastSquaresValue()
    {
        // By hand, x = 1, 2, 3 and y = 2, 4, 3: x̄ = 2, ȳ = 3; Σ(x−x̄)(y−ȳ) = (−1)(−1) + 0·1 + 1·0 = 1;
        // Σ(x−x̄)² = 2; slope = 1 / 2 = 0.5 (Legendre's least squares).
        Assert.Equal(0.5, LinearTrend.Slope([(1, 2), (2, 4), (3, 3)]), 12);
    }

    [Fact]
    public void Slope_OnePoint_IsZero()
    {
        Assert.Equal(0, LinearTrend.Slope([(5, 100)]));
    }
}
