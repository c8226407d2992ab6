using System.Globalization;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.IntegralRatio;

/// <summary>
/// 1H integrals against the formula and the hydrogen classes: the total must lie between the formula's
/// hydrogens less the exchangeable ones and the formula's hydrogens; every signal's count must be a sum of
/// classes; the counts must split over the classes; raw integrals must fit a whole-number scale.
/// Residual solvent, water and impurity signals are left out (their flags belong to solvent-residual).
/// </summary>
[Rule("integral-ratio", "1.0.0", "1H integrals add up to the formula and fit the hydrogen classes", Nuclei = ["1H"])]
public sealed class IntegralRatioRule : Rule<IntegralRatioOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, IntegralRatioOptions options, CancellationToken cancellationToken)
    {
        if (entry.Perception is null) yield break;
        for (var i = 0; i < entry.Spectra.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            if (entry.Spectra[i].Nucleus != Nucleus.H1 || entry.Analysis.Protons(i) is not { } interpretation) continue;
            foreach (var finding in CheckSpectrum(entry.Spectra[i], i, interpretation, options))
            {
                yield return finding;
            }
        }
    }

    private static IEnumerable<Finding> CheckSpectrum(Spectrum spectrum, int index, ProtonInterpretation interpretation, IntegralRatioOptions options)
    {
        foreach (var finding in Fractions(spectrum, index, interpretation, options)) yield return finding;
        if (interpretation.IntegralFit is { } fit && fit.WorstDeviation > options.IntegralTolerance)
        {
            yield return new Finding(IntegralRatioCodes.IntegralsFitNoScale, Severity.Warning,
                    Text($"The raw integrals fit no whole-number proton scale: the best scale leaves a signal {fit.WorstDeviation:0.00} H from a whole number (tolerance {options.IntegralTolerance:0.00} H)."))
                { Peaks = [PeakRef.WholeSpectrum(index)] }
                .WithEvidence("worst_deviation_h", Math.Round(fit.WorstDeviation, 3)).WithEvidence("tolerance_h", options.IntegralTolerance);
        }

        if (!interpretation.CountsKnown) yield break;
        var total = interpretation.ReportedProtons;
        var max = interpretation.StructureProtons;
        var min = max - interpretation.ExchangeableProtons;
        if (total < min || total > max)
        {
            yield return TotalMismatch(index, total, min, max);
            yield break;
        }

        var impossible = ImpossibleSignals(interpretation);
        foreach (var signal in impossible)
        {
            yield return new Finding(IntegralRatioCodes.ImpossibleSignalCount, Severity.Error,
                    Text($"The signal at {spectrum.Signals[signal].Describe()} integrates for {interpretation.ProtonCounts[signal]} H, which no combination of the structure's hydrogen environments makes."))
                { Peaks = [new PeakRef(index, signal)] }
                .WithEvidence("observed_h", interpretation.ProtonCounts[signal]!.Value);
        }

        if (impossible.Count == 0 && !CountsPartition(interpretation))
        {
            yield return new Finding(IntegralRatioCodes.CountsNotPartitionable, Severity.Warning,
                    Text($"The proton counts add up ({total} H) but cannot be split over the structure's hydrogen environments; check the integrals of overlapping signals."))
                { Peaks = [PeakRef.WholeSpectrum(index)] };
        }
    }

    private static Finding TotalMismatch(int index, int total, int min, int max)
    {
        var expected = min == max ? $"{max}" : $"{min}–{max}";
        var finding = new Finding(IntegralRatioCodes.TotalProtonsMismatch, Severity.Error,
                Text($"The 1H signals add up to {total} H but the formula has {max} H ({expected} H expected when exchangeable protons may be missing)."))
            { Peaks = [PeakRef.WholeSpectrum(index)] };
        return finding.WithEvidence("expected_min", min).WithEvidence("expected_max", max).WithEvidence("observed", total);
    }

    private static IEnumerable<Finding> Fractions(Spectrum spectrum, int index, ProtonInterpretation interpretation, IntegralRatioOptions options)
    {
        foreach (var signal in interpretation.CompoundSignals)
        {
            // A rotamer pair's shares are summed first: only a sum that is still fractional was rounded.
            var count = signal < interpretation.StatedCounts.Count ? interpretation.StatedCounts[signal] : spectrum.Signals[signal].ProtonCount;
            if (count is { } n && Math.Abs(n - Math.Round(n)) > options.FractionTolerance)
            {
                yield return new Finding(IntegralRatioCodes.FractionalCount, Severity.Info,
                        Text($"The signal at {spectrum.Signals[signal].Describe()} is reported with {n} H{Shares(interpretation, signal)}, not a whole number; it was read as {Math.Round(n)} H."))
                    { Peaks = [new PeakRef(index, signal)] }
                    .WithEvidence("observed_h", n);
            }
        }
    }

    private static string Shares(ProtonInterpretation interpretation, int signal) =>
        interpretation.RotamerPairs.Values.Contains(signal) ? " (with its minor-rotamer signal)" : "";

    private static List<int> ImpossibleSignals(ProtonInterpretation interpretation)
    {
        var reachable = ReachableCounts.Of(interpretation.Classes.Select(c => c.Size), interpretation.StructureProtons);
        return [.. interpretation.CompoundSignals.Where(i => interpretation.ProtonCounts[i] is not { } n || n <= 0 || n >= reachable.Length || !reachable[n])];
    }

    /// <summary>Counts alone (patterns ignored) can be split over the classes.</summary>
    private static bool CountsPartition(ProtonInterpretation interpretation)
    {
        var signals = interpretation.CompoundSignals.Select(i => new SignalInput(interpretation.ProtonCounts[i]!.Value, null)).ToList();
        var result = AssignmentSolver.Solve(interpretation.Classes, signals);
        return result.IsConsistent || !result.IsExhaustive;
    }

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
