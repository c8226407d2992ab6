using System.Globalization;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Analysis;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.SignalCount;

/// <summary>The 1H half of the signal-count rule.</summary>
internal static class ProtonCount
{
    public static IEnumerable<Finding> Check(IEntryView entry, int spectrumIndex, StructurePerception perception)
    {
        var interpretation = entry.Analysis.Protons(spectrumIndex)!;
        var spectrum = entry.Spectra[spectrumIndex];
        var expected = ExpectedSignals.Proton(perception.Equivalence, spectrum.Solvent);
        var (min, max) = (expected.Min, expected.Max);
        var observed = interpretation.CompoundSignals.Count;
        if (observed > max)
        {
            yield return TooMany(interpretation, spectrum, spectrumIndex, min, max);
        }
        else if (observed < min && !(interpretation.Assignment?.IsConsistent ?? false))
        {
            yield return new Finding(SignalCountCodes.TooFewProtonSignals, Severity.Warning,
                    Text($"The 1H list has {observed} signal(s) but the structure should give at least {min}, and the reported integrals do not show which environments overlap."))
                { Peaks = [PeakRef.WholeSpectrum(spectrumIndex)] }
                .WithEvidence("expected_min", min).WithEvidence("expected_max", max).WithEvidence("observed", observed);
        }
    }

    private static Finding TooMany(ProtonInterpretation interpretation, Spectrum spectrum, int spectrumIndex, int min, int max)
    {
        var surplus = SurplusCandidates(interpretation);
        var observed = interpretation.CompoundSignals.Count;
        var candidates = string.Join(", ", surplus.Select(s => spectrum.Signals[s].Describe()));
        return new Finding(SignalCountCodes.TooManyProtonSignals, Severity.Error,
                Text($"The 1H list has {observed} compound signals but the structure can give at most {max}. Signals most likely not of this compound: {candidates}."))
            { Peaks = [.. surplus.Select(s => new PeakRef(spectrumIndex, s))] }
            .WithEvidence("expected_min", min).WithEvidence("expected_max", max).WithEvidence("observed", observed);
    }

    /// <summary>Signals the best assignment left without a class; if none, the smallest signals.</summary>
    private static IReadOnlyList<int> SurplusCandidates(ProtonInterpretation interpretation)
    {
        var compound = interpretation.CompoundSignals;
        if (interpretation.Assignment is { } assignment)
        {
            var empty = compound.Where((_, k) => assignment.ClassesBySignal[k].Count == 0).ToList();
            if (empty.Count > 0) return empty;
        }

        var surplusCount = Math.Max(1, compound.Count - interpretation.Classes.Count);
        return [.. compound.OrderBy(i => interpretation.ProtonCounts[i] ?? 0).Take(surplusCount).Order()];
    }

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
