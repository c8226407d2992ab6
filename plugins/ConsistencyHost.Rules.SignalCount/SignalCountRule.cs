using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.SignalCount;

/// <summary>
/// Observed 1H and 13C signals against the structure's stereo-aware environments. The expected count is a
/// range (exchangeable protons may be missing, diastereotopic pairs may coincide, unspecified relative
/// configuration); only counts outside it are findings, and too few 1H signals only when the integrals cannot
/// explain the overlap. Residual solvent, water, impurity and minor-species signals are not counted.
/// </summary>
[Rule("signal-count", "1.0.0", "Number of 1H and 13C signals fits the structure's environments", Nuclei = ["1H", "13C"])]
public sealed class SignalCountRule : Rule<SignalCountOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, SignalCountOptions options, CancellationToken cancellationToken)
    {
        if (entry.Perception is not { } perception)
        {
            yield break;
        }

        for (var i = 0; i < entry.Spectra.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var spectrum = entry.Spectra[i];
            var findings = spectrum.Nucleus switch
            {
                Nucleus.H1 when options.CheckProton => ProtonCount.Check(entry, i, perception),
                Nucleus.C13 when options.CheckCarbon => CarbonCount.Check(spectrum, i, perception, options),
                _ => [],
            };
            foreach (var finding in findings)
            {
                yield return finding;
            }
        }
    }
}
