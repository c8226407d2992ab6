using System.Globalization;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Engine.Intake;

/// <summary>
/// Range checks for the numbers a submission carries beside the shifts: a NaN frequency, a negative temperature or
/// a negative proton count is a broken export, and reading on would give findings about numbers nobody wrote.
/// Each refusal names the field path (proto names) and the accepted range.
/// </summary>
internal static class NumericRanges
{
    // Generous physical bounds, not plausibility windows (values from memory): the strongest NMR magnets in use
    // run near 1.2–1.3 GHz for 1H, and variable-temperature work stays well inside 1–1,000 K.
    private const double MaxFrequencyMHz = 2_000;
    private const double MaxTemperatureK = 1_000;

    // Largest coupling accepted, Hz: one-bond couplings to heavy nuclei reach a few kHz (from memory).
    private const double MaxCouplingHz = 10_000;

    // An m/z beyond this is no small-molecule HRMS claim (from memory: small-molecule HRMS stays under a few kDa).
    private const double MaxMz = 100_000;

    /// <summary>Frequency and temperature stated beside a spectrum.</summary>
    public static void CheckConditions(SpectrumSubmission input, string field)
    {
        if (input.FrequencyMHz is { } mhz && !(double.IsFinite(mhz) && mhz > 0 && mhz <= MaxFrequencyMHz))
        {
            throw Refuse($"{field}.frequency_mhz", mhz, $"a frequency above 0 and at most {MaxFrequencyMHz} MHz");
        }

        if (input.TemperatureK is { } kelvin && !(double.IsFinite(kelvin) && kelvin > 0 && kelvin <= MaxTemperatureK))
        {
            throw Refuse($"{field}.temperature_k", kelvin, $"a temperature in kelvin above 0 and at most {MaxTemperatureK} K");
        }
    }

    /// <summary>Counts, integral and couplings of one structured peak.</summary>
    public static void CheckPeak(Signal signal, string field)
    {
        if (signal.ProtonCount is { } protons && !(double.IsFinite(protons) && protons >= 0))
        {
            throw Refuse($"{field}.proton_count", protons, "a proton count of 0 or more");
        }

        if (signal.Integral is { } integral && !(double.IsFinite(integral) && integral >= 0))
        {
            throw Refuse($"{field}.integral", integral, "an integral of 0 or more");
        }

        if (signal.CarbonCount is { } carbons && carbons < 1)
        {
            throw Refuse($"{field}.carbon_count", carbons, "a carbon count of 1 or more");
        }

        for (var j = 0; j < signal.Couplings.Count; j++)
        {
            var hz = signal.Couplings[j].Hz;
            if (!(double.IsFinite(hz) && hz >= 0 && hz <= MaxCouplingHz))
            {
                throw Refuse($"{field}.couplings_hz[{j}]", hz, $"a coupling constant magnitude from 0 to {MaxCouplingHz} Hz");
            }
        }
    }

    /// <summary>The m/z values of one HRMS claim.</summary>
    public static void CheckHrms(HrmsClaim claim, string field)
    {
        if (!(double.IsFinite(claim.CalculatedMz) && claim.CalculatedMz > 0 && claim.CalculatedMz <= MaxMz))
        {
            throw Refuse($"{field}.calculated_mz", claim.CalculatedMz, $"an m/z above 0 and at most {MaxMz}");
        }

        if (claim.FoundMz is { } found && !(double.IsFinite(found) && found > 0 && found <= MaxMz))
        {
            throw Refuse($"{field}.found_mz", found, $"an m/z above 0 and at most {MaxMz}");
        }
    }

    private static EntryInputException Refuse(string field, double value, string expected) =>
        new(field, string.Create(CultureInfo.InvariantCulture, $"is {value}; expected {expected}"));
}
