using System.Globalization;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.SpectrumMetadata;

/// <summary>
/// Every spectrum states its solvent and observe frequency, each frequency is one a magnet can have for its
/// nucleus, and frequencies of different nuclei in one entry belong to one magnet (13C at 101 MHz goes with
/// 1H at 400 MHz, not 500 MHz). A reviewer needs all three to judge the data.
/// </summary>
[Rule("spectrum-metadata", "1.0.0", "Every spectrum states its solvent and a plausible observe frequency")]
public sealed class SpectrumMetadataRule : Rule<SpectrumMetadataOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, SpectrumMetadataOptions options, CancellationToken cancellationToken)
    {
        for (var i = 0; i < entry.Spectra.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            foreach (var finding in CheckOne(entry.Spectra[i], i, options))
            {
                yield return finding;
            }
        }

        foreach (var finding in CheckOneMagnet(entry.Spectra, options))
        {
            yield return finding;
        }
    }

    private static IEnumerable<Finding> CheckOne(Spectrum spectrum, int index, SpectrumMetadataOptions options)
    {
        var label = spectrum.Nucleus.ToLabel();
        var where = PeakRef.WholeSpectrum(index);
        if (options.RequireSolvent && string.IsNullOrWhiteSpace(spectrum.Solvent))
        {
            yield return new Finding(SpectrumMetadataCodes.SolventNotStated, Severity.Warning,
                $"The {label} spectrum does not state its solvent; shifts cannot be judged without it.") { Peaks = [where] };
        }

        if (options.RequireFrequency && spectrum.FrequencyMHz is null)
        {
            yield return new Finding(SpectrumMetadataCodes.FrequencyNotStated, Severity.Warning,
                $"The {label} spectrum does not state its observe frequency (MHz).") { Peaks = [where] };
        }

        if (options.RequireTemperature && spectrum.TemperatureK is null)
        {
            yield return new Finding(SpectrumMetadataCodes.TemperatureNotStated, Severity.Info,
                $"The {label} spectrum does not state its temperature.") { Peaks = [where] };
        }

        if (spectrum.FrequencyMHz is { } mhz && ImpliedProtonMHz(spectrum.Nucleus, mhz) is { } proton
            && proton is < MagnetFrequencies.LowestProtonMHz or > MagnetFrequencies.HighestProtonMHz)
        {
            yield return new Finding(SpectrumMetadataCodes.FrequencyImplausible, Severity.Warning,
                    $"The {label} spectrum states {Format(mhz)} MHz, which would need a {Format(proton)} MHz magnet; " +
                    $"magnets range from {MagnetFrequencies.LowestProtonMHz} to {MagnetFrequencies.HighestProtonMHz} MHz (1H).") { Peaks = [where] }
                .WithEvidence("stated_mhz", mhz)
                .WithEvidence("implied_1h_mhz", Math.Round(proton, 1));
        }
    }

    private static IEnumerable<Finding> CheckOneMagnet(IReadOnlyList<Spectrum> spectra, SpectrumMetadataOptions options)
    {
        var protonIndex = IndexOfFirst(spectra, Nucleus.H1);
        if (protonIndex < 0 || spectra[protonIndex].FrequencyMHz is not { } protonMhz)
        {
            yield break;
        }

        for (var i = 0; i < spectra.Count; i++)
        {
            var other = spectra[i];
            if (other.Nucleus is Nucleus.H1 or Nucleus.Unknown || other.FrequencyMHz is not { } mhz)
            {
                continue;
            }

            var implied = mhz / MagnetFrequencies.RatioToProton(other.Nucleus);
            if (Math.Abs(implied - protonMhz) / protonMhz > options.FrequencyTolerance)
            {
                var expected = protonMhz * MagnetFrequencies.RatioToProton(other.Nucleus);
                yield return new Finding(SpectrumMetadataCodes.FrequencyMismatch, Severity.Info,
                        $"The {other.Nucleus.ToLabel()} spectrum at {Format(mhz)} MHz belongs to a {Format(implied)} MHz magnet, " +
                        $"but the 1H spectrum states {Format(protonMhz)} MHz (expected about {Format(expected)} MHz). " +
                        "The spectra may come from different instruments, or a frequency is mistyped.")
                    { Peaks = [PeakRef.WholeSpectrum(protonIndex), PeakRef.WholeSpectrum(i)] }
                    .WithEvidence("expected_mhz", Math.Round(expected, 1))
                    .WithEvidence("observed_mhz", mhz);
            }
        }
    }

    private static double? ImpliedProtonMHz(Nucleus nucleus, double mhz)
    {
        var ratio = MagnetFrequencies.RatioToProton(nucleus);
        return double.IsNaN(ratio) ? null : mhz / ratio;
    }

    private static int IndexOfFirst(IReadOnlyList<Spectrum> spectra, Nucleus nucleus)
    {
        for (var i = 0; i < spectra.Count; i++)
        {
            if (spectra[i].Nucleus == nucleus) return i;
        }

        return -1;
    }

    private static string Format(double value) => Math.Round(value, 1).ToString("0.#", CultureInfo.InvariantCulture);
}
