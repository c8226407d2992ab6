using System.ComponentModel.DataAnnotations;
using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>Options of the coupling-partners rule.</summary>
public sealed record CouplingPartnersOptions : RuleOptions
{
    /// <summary>
    /// Smallest tolerance when comparing two J values, Hz. Default 0.3 Hz: J values are reported to 0.1 Hz
    /// but measured on a digital resolution of typically 0.2–0.3 Hz, so partners differ by a few tenths
    /// (common practice). Values written with fewer decimals widen it to one unit of the last decimal.
    /// </summary>
    [Range(0.05, 2.0)]
    public double MinimumToleranceHz { get; init; } = 0.3;

    /// <summary>
    /// Tolerance when either multiplet is a t, q or larger (one J for several protons), Hz. Default 0.6:
    /// such a pattern is often really a dd/ddd with nearly equal couplings, reported with their average, so it
    /// differs from each partner's own value by a few tenths (common practice; "apparent triplet").
    /// </summary>
    [Range(0.05, 3.0)]
    public double EqualCouplingToleranceHz { get; init; } = 0.6;

    /// <summary>
    /// J values below this are not required to have a partner, Hz. Default 3.0: long-range (meta, allylic,
    /// W) couplings of 1–3 Hz are often resolved in only one of the two multiplets (common practice).
    /// </summary>
    [Range(0.0, 20.0)]
    public double SmallestPartneredJHz { get; init; } = 3.0;

    /// <summary>
    /// Allowed ratio between a reported range and the width of the first-order multiplet it describes
    /// (sum of (lines − 1) × J). Default 2: ranges are read from peak edges and include line widths.
    /// </summary>
    [Range(1.1, 10.0)]
    public double RangeWidthRatio { get; init; } = 2.0;
}
