using System.ComponentModel.DataAnnotations;
using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Rules.MassFormula;

/// <summary>Options of the mass-formula rule.</summary>
public sealed record MassFormulaOptions : RuleOptions
{
    /// <summary>
    /// Largest accepted |found − calculated| in ppm. Default 5: the ±5 ppm acceptance window of the ACS
    /// guidelines for accurate-mass data (third-party paraphrase, nmr-data-standards.md §7.3).
    /// </summary>
    [Range(0.1, 100)]
    public double FoundWindowPpm { get; init; } = 5;

    /// <summary>
    /// An absolute alternative window in mDa: a found value within this many mDa passes even when it is
    /// outside <see cref="FoundWindowPpm"/>. Default 0 (off); the same paraphrase allows "or 3 mDa", which
    /// is more lenient than 5 ppm below m/z 600, so a profile turns it on deliberately.
    /// </summary>
    [Range(0, 50)]
    public double FoundWindowMDa { get; init; }

    /// <summary>
    /// Smallest tolerance, in mDa, when comparing the author's calculated m/z with ours; the tolerance is
    /// otherwise half a unit of the last decimal written (plus 0.005 mDa). Default 0.1 mDa: values given to 5
    /// or 6 decimals were computed with mass tables and adduct constants that differ by a few µu (a common
    /// calculator's Na adduct differs by 2.7 µu, nmr-data-standards.md §7.3). At most 0.5 mDa, so an omitted
    /// electron (0.549 mDa) still stands out.
    /// </summary>
    [Range(0.01, 0.5)]
    public double MinimumCalculatedToleranceMDa { get; init; } = 0.1;
}
