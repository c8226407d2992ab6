using ConsistencyHost.LoadGenerator.Measuring;

namespace ConsistencyHost.LoadGenerator.Tests;

public sealed class PercentilesTests
{
    // Common practice: nearest-rank percentile, rank = ⌈p/100 · N⌉ (1-based) into the sorted samples. The five
    // values and the answers are the textbook worked example of the method (from memory of the Wikipedia
    // "Percentile" article), checked by hand: N = 5; p5 → rank 1 = 15, p30 → rank 2 = 20, p40 → rank 2 = 20,
    // p50 → rank 3 = 35, p100 → rank 5 = 50.
    [Theory]
    [InlineData(5, 15)]
    [InlineData(30, 20)]
    [InlineData(40, 20)]
    [InlineData(50, 35)]
    [InlineData(100, 50)]
    public void NearestRank_FiveValueWorkedExample_IsTheSampleAtTheCeilingRank(double p, double expected)
    {
        double[] sorted = [15, 20, 35, 40, 50];

        Assert.Equal(expected, Percentiles.NearestRank(sorted, p));
    }

    // Common practice: nearest rank; by hand for 1..1000 ms, p99 → rank ⌈990⌉ = 990 and p50 → rank 500; for 1..150,
    // p99 → rank ⌈148.5⌉ = 149 (an observed value, not an interpolation between 148 and 149).
    [Theory]
    [InlineData(1000, 99, 990)]
    [InlineData(1000, 50, 500)]
    [InlineData(150, 99, 149)]
    [InlineData(150, 0, 1)]
    public void NearestRank_OneToN_IsTheHandComputedRank(int count, double p, double expected)
    {
        var sorted = Enumerable.Range(1, count).Select(i => (double)i).ToArray();

        Assert.Equal(expected, Percentiles.NearestRank(sorted, p));
    }

    [Fact]
    public void NearestRank_NoSamples_ThrowsNamingTheProblem()
    {
        var error = Assert.Throws<ArgumentException>(() => Percentiles.NearestRank([], 50));

        Assert.StartsWith("no samples", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void LatencySummary_UnsortedInput_SortsBeforeTakingRanks()
    {
        // By hand: sorted 1..10; p50 → rank 5 = 5, p99 → rank ⌈9.9⌉ = 10.
        var summary = LatencySummary.Of([7, 3, 10, 1, 9, 2, 8, 4, 6, 5]);

        Assert.Equal(new LatencySummary(10, 5, 10, 10), summary);
    }
}
