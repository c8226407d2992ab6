using System.Globalization;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Analysis;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Rules.SolventResidual;

/// <summary>
/// Residual solvent, water and common impurities (Gottlieb et al. 1997; Fulmer et al. 2010). A 1H signal is
/// flagged only when the interpretation of the list against the structure explains the data better without it
/// (so a compound signal that happens to sit at 7.26 ppm is never blamed), and only when its shape fits the
/// tabulated line. A 13C line on the solvent's own line is flagged when the list has more lines than carbon
/// environments. A compound that is itself a tabulated solvent is not its own impurity.
/// </summary>
[Rule("solvent-residual", "1.0.0", "Residual solvent, water and impurity lines are not reported as the compound's", Nuclei = ["1H", "13C"])]
public sealed class SolventResidualRule : Rule<SolventResidualOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, SolventResidualOptions options, CancellationToken cancellationToken)
    {
        for (var i = 0; i < entry.Spectra.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var spectrum = entry.Spectra[i];
            if (spectrum.Nucleus is not (Nucleus.H1 or Nucleus.C13)) continue;
            if (Uncheckable(spectrum, i, options) is { } uncheckable)
            {
                yield return uncheckable;
                continue;
            }

            var findings = spectrum.Nucleus == Nucleus.H1
                ? ProtonFindings(entry, spectrum, i, options)
                : CarbonFindings(entry, spectrum, i);
            foreach (var finding in findings) yield return finding;
        }
    }

    private static Finding? Uncheckable(Spectrum spectrum, int index, SolventResidualOptions options)
    {
        var normalised = SolventNames.Normalise(spectrum.Solvent);
        if (normalised is not null && ResidualSolventTable.For(normalised, spectrum.Nucleus).Any()) return null;
        if (!options.ReportUncheckableSolvent) return null;
        return string.IsNullOrWhiteSpace(spectrum.Solvent)
            ? new Finding(SolventResidualCodes.SolventMissing, Severity.Info,
                $"The {spectrum.Nucleus.ToLabel()} spectrum states no solvent, so residual solvent and water lines cannot be checked.") { Peaks = [PeakRef.WholeSpectrum(index)] }
            : new Finding(SolventResidualCodes.SolventNotTabulated, Severity.Info,
                $"The solvent '{spectrum.Solvent}' of the {spectrum.Nucleus.ToLabel()} spectrum has no tabulated residual lines; they were not checked.") { Peaks = [PeakRef.WholeSpectrum(index)] };
    }

    private static IEnumerable<Finding> ProtonFindings(IEntryView entry, Spectrum spectrum, int index, SolventResidualOptions options)
    {
        if (entry.Analysis.Protons(index) is not { } interpretation) yield break;
        for (var s = 0; s < spectrum.Signals.Count; s++)
        {
            var match = interpretation.Residuals.Matches.FirstOrDefault(m => m.SignalIndex == s);
            switch (interpretation.Roles[s])
            {
                case SignalRole.ResidualSolvent:
                    yield return Residual(spectrum, index, s, match!, "the integrals add up better without it");
                    break;
                case SignalRole.Water:
                    yield return new Finding(SolventResidualCodes.WaterReported, Severity.Warning,
                            Text($"The signal at {spectrum.Signals[s].Describe()} sits on water in {spectrum.Solvent} ({match!.ReferencePpm:0.00} ppm) and the integrals add up better without it; water should not be counted among the compound's protons."))
                        { Peaks = [new PeakRef(index, s)] }
                        .WithEvidence("reference_ppm", match.ReferencePpm).WithEvidence("deviation_ppm", Math.Round(match.DeviationPpm, 3));
                    break;
            }
        }

        if (options.ReportImpurities)
        {
            foreach (var finding in Impurities(spectrum, index, interpretation)) yield return finding;
        }
    }

    private static IEnumerable<Finding> Impurities(Spectrum spectrum, int index, ProtonInterpretation interpretation)
    {
        var bySubstance = Enumerable.Range(0, spectrum.Signals.Count)
            .Where(s => interpretation.Roles[s] == SignalRole.Impurity)
            .Select(s => (Signal: s, Match: interpretation.Residuals.Matches.First(m => m.SignalIndex == s && m.Kind == ResidualMatchKind.Impurity)))
            .GroupBy(x => x.Match.Name, StringComparer.Ordinal);
        foreach (var group in bySubstance)
        {
            var signals = group.Select(x => x.Signal).ToList();
            var source = group.First().Match.Source;
            yield return new Finding(SolventResidualCodes.ImpuritySignals, Severity.Info,
                    Text($"{signals.Count} signal(s) ({string.Join(", ", signals.Select(s => spectrum.Signals[s].Describe()))}) match {group.Key} in {spectrum.Solvent} and are not needed by the structure; the sample may contain {group.Key} (shifts: {source})."))
                { Peaks = [.. signals.Select(s => new PeakRef(index, s))] }
                .WithEvidence("impurity", group.Key).WithEvidence("signals", signals.Count);
        }
    }

    private static IEnumerable<Finding> CarbonFindings(IEntryView entry, Spectrum spectrum, int index)
    {
        if (entry.Perception is not { } perception) yield break;
        var counted = spectrum.Signals.Count(s => !s.IsMinorSpecies());
        if (counted <= ExpectedSignals.Carbon(perception.Equivalence).Max) yield break;
        foreach (var match in new ResidualMatcher().Match(spectrum).Matches.Where(m => m.Kind == ResidualMatchKind.ResidualSolvent))
        {
            yield return Residual(spectrum, index, match.SignalIndex, match, "the list has more lines than the structure has carbon environments");
        }
    }

    private static Finding Residual(Spectrum spectrum, int index, int signal, ResidualMatch match, string why) =>
        new Finding(SolventResidualCodes.ResidualSolventReported, Severity.Warning,
                Text($"The signal at {spectrum.Signals[signal].Describe()} sits on the residual line of {match.Name} ({match.Group}, {match.ReferencePpm:0.00} ppm) and {why}; it should not be listed as a compound signal."))
            { Peaks = [new PeakRef(index, signal)] }
            .WithEvidence("reference_ppm", match.ReferencePpm).WithEvidence("deviation_ppm", Math.Round(match.DeviationPpm, 3));

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
