using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Model;

namespace Lab.RulePlugin;

/// <summary>Every 1H spectrum lists at least <see cref="ExampleOptions.MinimumSignals"/> signals.</summary>
[Rule("lab-example-rule", "1.0.0", "Every 1H spectrum lists enough signals", Nuclei = ["1H"])]
public sealed class ExampleRule : Rule<ExampleOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, ExampleOptions options, CancellationToken cancellationToken)
    {
        for (var i = 0; i < entry.Spectra.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var spectrum = entry.Spectra[i];
            if (spectrum.Nucleus == Nucleus.H1 && spectrum.Signals.Count < options.MinimumSignals)
            {
                yield return new Finding(ExampleCodes.TooFewSignals, Severity.Warning,
                        $"The 1H spectrum lists {spectrum.Signals.Count} signal(s); at least {options.MinimumSignals} expected.")
                    { Peaks = [PeakRef.WholeSpectrum(i)] }
                    .WithEvidence("listed", spectrum.Signals.Count)
                    .WithEvidence("minimum", options.MinimumSignals);
            }
        }
    }
}
