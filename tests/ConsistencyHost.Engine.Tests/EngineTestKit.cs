using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Engine.Tests;

/// <summary>Small builders for submissions used across engine tests.</summary>
internal static class EngineTestKit
{
    /// <summary>A 1H spectrum with one singlet, solvent and frequency as given.</summary>
    public static SpectrumSubmission ProtonSpectrum(string? solvent = "CDCl3", double? mhz = 400) => new()
    {
        Nucleus = "1H",
        Solvent = solvent,
        FrequencyMHz = mhz,
        Signals = [new Signal { ShiftPpm = 2.10, Multiplicity = "s", ProtonCount = 3 }],
    };

    /// <summary>A 13C spectrum with one line.</summary>
    public static SpectrumSubmission CarbonSpectrum(double? mhz, string? solvent = "CDCl3") => new()
    {
        Nucleus = "13C",
        Solvent = solvent,
        FrequencyMHz = mhz,
        Signals = [new Signal { ShiftPpm = 170.1 }],
    };

    public static EntrySubmission Entry(params SpectrumSubmission[] spectra) => new()
    {
        EntryId = "AIS-LQ-T001",
        Spectra = spectra,
    };
}
