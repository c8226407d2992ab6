using System.Globalization;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Model;

namespace Lindqvist.CouplingsListed;

/// <summary>
/// The Lindqvist group's reporting policy: every 1H signal reported as split (d, t, q, dd, td, …) lists its
/// coupling constants, one per letter of the multiplicity, so that a reader can find each partner.
/// </summary>
[Rule("lindqvist-couplings-listed", "1.0.0", "Split 1H signals list their coupling constants", Nuclei = ["1H"])]
public sealed class CouplingsListedRule : Rule<CouplingsListedOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, CouplingsListedOptions options, CancellationToken cancellationToken)
    {
        for (var s = 0; s < entry.Spectra.Count; s++)
        {
            if (entry.Spectra[s].Nucleus != Nucleus.H1)
            {
                continue;
            }

            for (var i = 0; i < entry.Spectra[s].Signals.Count; i++)
            {
                cancellationToken.ThrowIfCancellationRequested();
                if (CheckSignal(entry.Spectra[s].Signals[i], new PeakRef(s, i), options) is { } finding)
                {
                    yield return finding;
                }
            }
        }
    }

    private static Finding? CheckSignal(Signal signal, PeakRef where, CouplingsListedOptions options)
    {
        var (core, broadened) = MultipletPattern.Strip(signal.Multiplicity);
        var expected = MultipletPattern.CouplingCount(core);
        var listed = signal.Couplings.Count;
        if (expected == 0 || (broadened && options.IgnoreBroadened) || listed >= expected)
        {
            return null;
        }

        if (listed > 0 && !options.RequireEveryCoupling)
        {
            return null;
        }

        var at = signal.CentrePpm.ToString("0.00", CultureInfo.InvariantCulture);
        var finding = listed == 0
            ? new Finding(CouplingsListedCodes.Missing, Severity.Warning,
                $"The 1H signal at {at} ppm is reported as {signal.Multiplicity.Trim()} but lists no coupling constant (J in Hz).")
            : new Finding(CouplingsListedCodes.Incomplete, Severity.Info,
                $"The 1H signal at {at} ppm is reported as {signal.Multiplicity.Trim()}, which has {expected} coupling constants, but lists {listed}.");
        return (finding with { Peaks = [where] })
            .WithEvidence("expected_j_count", expected)
            .WithEvidence("listed_j_count", listed);
    }
}
