namespace ConsistencyHost.Rules.IntegralRatio;

/// <summary>The stable finding codes of the integral-ratio rule.</summary>
public static class IntegralRatioCodes
{
    /// <summary>The reported protons do not add up to the formula's hydrogens (exchangeable ones may be missing).</summary>
    public const string TotalProtonsMismatch = "total-protons-mismatch";

    /// <summary>A signal's proton count that no combination of the structure's hydrogen classes can make.</summary>
    public const string ImpossibleSignalCount = "impossible-signal-count";

    /// <summary>The counts add up, but cannot be split over the structure's hydrogen classes.</summary>
    public const string CountsNotPartitionable = "counts-not-partitionable";

    /// <summary>Raw integrals that fit no whole-number proton scale within tolerance.</summary>
    public const string IntegralsFitNoScale = "integrals-fit-no-scale";

    /// <summary>A reported proton count that is not a whole number.</summary>
    public const string FractionalCount = "fractional-count";
}
