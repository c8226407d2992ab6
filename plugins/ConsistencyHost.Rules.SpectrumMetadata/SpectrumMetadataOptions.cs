using System.ComponentModel.DataAnnotations;
using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Rules.SpectrumMetadata;

/// <summary>Options of the spectrum-metadata rule.</summary>
public sealed record SpectrumMetadataOptions : RuleOptions
{
    /// <summary>Every spectrum must state its solvent. Default true: journals ask for it (common practice).</summary>
    public bool RequireSolvent { get; init; } = true;

    /// <summary>Every spectrum must state its observe frequency. Default true (common practice).</summary>
    public bool RequireFrequency { get; init; } = true;

    /// <summary>Every spectrum must state its temperature. Default false: most reports omit room temperature.</summary>
    public bool RequireTemperature { get; init; }

    /// <summary>
    /// Relative tolerance when comparing the 1H frequency implied by another nucleus's frequency with the
    /// stated 1H frequency. Default 0.03: reported frequencies are rounded ("101 MHz", "126 MHz") and some
    /// authors round a 100.6 MHz carbon frequency to 100 MHz.
    /// </summary>
    [Range(0.001, 0.5)]
    public double FrequencyTolerance { get; init; } = 0.03;
}
