using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// A first-order multiplet reported as a range spans Σ (lines − 1) × J hertz between its outer lines; the
/// range (in ppm × MHz) should be about that wide. Only checked when the frequency is known and the pattern
/// is first order with all its J values.
/// </summary>
internal static class RangeWidthCheck
{
    /// <summary>Line width allowance added to the expected width, Hz (common practice: ~1 Hz lines).</summary>
    private const double LineWidthHz = 2.0;

    public static IEnumerable<Finding> Check(Spectrum spectrum, int spectrumIndex, CouplingPartnersOptions options)
    {
        if (spectrum.FrequencyMHz is not { } mhz || mhz <= 0) yield break;
        for (var i = 0; i < spectrum.Signals.Count; i++)
        {
            var signal = spectrum.Signals[i];
            var pattern = signal.MultiplicityPattern;
            if (signal.RangeLowPpm is not { } low || signal.RangeHighPpm is not { } high) continue;
            if (!pattern.IsFirstOrder || pattern.IsBroad || pattern.IsApparent || pattern.IsSinglet) continue;
            if (pattern.ExpectedCouplingCount() != signal.Couplings.Count) continue;
            var expectedHz = pattern.Components.Zip(signal.Couplings, (lines, j) => (lines - 1) * j.Hz).Sum();
            var reportedHz = Math.Abs(high - low) * mhz;
            if (reportedHz <= (expectedHz * options.RangeWidthRatio) + LineWidthHz && reportedHz >= (expectedHz / options.RangeWidthRatio) - LineWidthHz) continue;
            var text = string.Create(CultureInfo.InvariantCulture,
                $"The range {signal.Describe()} spans {reportedHz:0.#} Hz at {mhz:0.#} MHz, but a '{signal.Multiplicity}' with the reported J values spans about {expectedHz:0.#} Hz.");
            yield return new Finding(CouplingPartnersCodes.RangeWidthMismatch, Severity.Warning, text) { Peaks = [new PeakRef(spectrumIndex, i)] }
                .WithEvidence("expected_hz", Math.Round(expectedHz, 1)).WithEvidence("observed_hz", Math.Round(reportedHz, 1));
        }
    }
}
