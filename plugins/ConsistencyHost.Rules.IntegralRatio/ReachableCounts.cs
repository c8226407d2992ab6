namespace ConsistencyHost.Rules.IntegralRatio;

/// <summary>Which proton counts a signal can have: the sums of distinct hydrogen classes (subset sums).</summary>
internal static class ReachableCounts
{
    public static bool[] Of(IEnumerable<int> classSizes, int total)
    {
        var reachable = new bool[total + 1];
        reachable[0] = true;
        foreach (var size in classSizes)
        {
            for (var sum = total; sum >= size; sum--)
            {
                reachable[sum] |= reachable[sum - size];
            }
        }

        return reachable;
    }
}
