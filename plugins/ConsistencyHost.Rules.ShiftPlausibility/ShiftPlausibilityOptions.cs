using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Rules.ShiftPlausibility;

/// <summary>Options of the shift-plausibility rule.</summary>
public sealed record ShiftPlausibilityOptions : RuleOptions
{
    /// <summary>A 1H signal this far (ppm) or more outside every window is an error; closer, a warning. Default 1.0.</summary>
    public double ProtonFarPpm { get; init; } = 1.0;

    /// <summary>A 13C line this far (ppm) or more outside every window is an error; closer, a warning. Default 10.</summary>
    public double CarbonFarPpm { get; init; } = 10;

    /// <summary>
    /// Slack (ppm) added to every 1H window before judging, for referencing and rounding in reported lists.
    /// Default 0.05 (common practice: lists are printed to 0.01 ppm and referenced to ±0.02).
    /// </summary>
    public double ProtonSlackPpm { get; init; } = 0.05;

    /// <summary>Slack (ppm) added to every 13C window before judging. Default 0.5 (common practice).</summary>
    public double CarbonSlackPpm { get; init; } = 0.5;
}
