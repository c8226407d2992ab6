using System.Globalization;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Analysis;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Rules.SignalCount;

/// <summary>The 13C half of the signal-count rule.</summary>
internal static class CarbonCount
{
    public static IEnumerable<Finding> Check(Spectrum spectrum, int spectrumIndex, StructurePerception perception, SignalCountOptions options)
    {
        var expected = ExpectedSignals.Carbon(perception.Equivalence);
        var (min, max) = (expected.Min, expected.Max);
        var lines = CountedLines(spectrum, max);
        if (lines.Count > max)
        {
            yield return new Finding(SignalCountCodes.TooManyCarbonSignals, Severity.Error,
                    Text($"The 13C list has {lines.Count} lines but the structure has at most {max} carbon environments."))
                { Peaks = [PeakRef.WholeSpectrum(spectrumIndex)] }
                .WithEvidence("expected_min", min).WithEvidence("expected_max", max).WithEvidence("observed", lines.Count);
            yield break;
        }

        // A line annotated "(2C)" may stand for two environments that coincide.
        var covered = lines.Sum(i => Math.Max(1, spectrum.Signals[i].CarbonCount ?? 1));
        var deficit = min - covered;
        if (deficit > 0)
        {
            var severity = deficit > options.TolerableMissingCarbonLines ? Severity.Warning : Severity.Info;
            yield return new Finding(SignalCountCodes.TooFewCarbonSignals, severity,
                    Text($"The 13C list has {lines.Count} lines for {min} carbon environments; {deficit} line(s) are missing or overlap without a (nC) note."))
                { Peaks = [PeakRef.WholeSpectrum(spectrumIndex)] }
                .WithEvidence("expected_min", min).WithEvidence("expected_max", max).WithEvidence("observed", lines.Count);
        }
    }

    /// <summary>The lines counted for the compound: minor species never; solvent lines only when the list is over-full.</summary>
    private static List<int> CountedLines(Spectrum spectrum, int max)
    {
        var lines = Enumerable.Range(0, spectrum.Signals.Count)
            .Where(i => !spectrum.Signals[i].IsMinorSpecies())
            .ToList();
        if (lines.Count <= max) return lines;
        var solvent = new ResidualMatcher().Match(spectrum).Matches
            .Where(m => m.Kind == ResidualMatchKind.ResidualSolvent)
            .Select(m => m.SignalIndex)
            .ToHashSet();
        return [.. lines.Where(i => !solvent.Contains(i))];
    }

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
