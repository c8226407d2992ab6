using System.ComponentModel.DataAnnotations;
using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Rules.IntegralRatio;

/// <summary>Options of the integral-ratio rule.</summary>
public sealed record IntegralRatioOptions : RuleOptions
{
    /// <summary>
    /// Largest deviation, in protons, of a raw integral from its whole-number reading. Default 0.25: routine
    /// 1H integrals are good to a few percent, a quarter proton leaves room for baseline and overlap
    /// (nmr-methods notes §4.3).
    /// </summary>
    [Range(0.05, 0.5)]
    public double IntegralTolerance { get; init; } = 0.25;

    /// <summary>
    /// How far a stated count may be from a whole number before it is reported as fractional. Default 0.05
    /// (counts such as 0.5H for a rotamer mixture are real information, not rounding).
    /// </summary>
    [Range(0.0, 0.5)]
    public double FractionTolerance { get; init; } = 0.05;
}
