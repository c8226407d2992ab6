using System.ComponentModel.DataAnnotations;
using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Rules.SignalCount;

/// <summary>Options of the signal-count rule.</summary>
public sealed record SignalCountOptions : RuleOptions
{
    /// <summary>
    /// Missing 13C lines reported only as info, not as a warning. Default 1: one accidental overlap of two
    /// carbon environments (typically aromatic CH) is common and often not annotated (common practice).
    /// </summary>
    [Range(0, 100)]
    public int TolerableMissingCarbonLines { get; init; } = 1;

    /// <summary>Check 1H lists. Default true.</summary>
    public bool CheckProton { get; init; } = true;

    /// <summary>Check 13C lists. Default true.</summary>
    public bool CheckCarbon { get; init; } = true;
}
