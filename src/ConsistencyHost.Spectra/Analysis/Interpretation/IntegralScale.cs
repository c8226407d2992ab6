
namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>The best whole-number reading of raw integrals.</summary>
/// <param name="Counts">The proton count read for each integral.</param>
/// <param name="ProtonsPerUnit">Integral units per proton (the fitted scale).</param>
/// <param name="WorstDeviation">Largest |integral / scale − count| over the signals, in protons.</param>
public sealed record IntegralFit(IReadOnlyList<int> Counts, double ProtonsPerUnit, double WorstDeviation);

/// <summary>
/// Fits raw integrals (JCAMP-DX Y values, NMReDATA E=) to whole proton counts: for every plausible total
/// proton count, scale so the integrals sum to it, round, then refine the scale by least squares through the
/// origin (counts against integrals; MathNet.Numerics <c>Fit.LineThroughOrigin</c>) and keep the total whose
/// rounding leaves the smallest worst deviation.
/// </summary>
/// <remarks>Method: integral normalisation as in nmr-methods notes §4.2 (least-squares scale fit).</remarks>
public static class IntegralScale
{
    /// <summary>Fits <paramref name="integrals"/> for totals between <paramref name="minTotal"/> and <paramref name="maxTotal"/>.</summary>
    public static IntegralFit? Fit(IReadOnlyList<double> integrals, int minTotal, int maxTotal)
    {
        ArgumentNullException.ThrowIfNull(integrals);
        var sum = integrals.Sum();
        if (integrals.Count == 0 || sum <= 0 || integrals.Any(i => i < 0 || !double.IsFinite(i))) return null;
        IntegralFit? best = null;
        for (var total = Math.Max(1, minTotal); total <= Math.Max(minTotal, maxTotal); total++)
        {
            var fit = FitForTotal(integrals, sum / total);
            if (best is null || fit.WorstDeviation < best.WorstDeviation - 1e-9) best = fit;
        }

        return best;
    }

    private static IntegralFit FitForTotal(IReadOnlyList<double> integrals, double unitsPerProton)
    {
        var counts = integrals.Select(i => Math.Max(1, (int)Math.Round(i / unitsPerProton))).ToArray();
        var refined = MathNet.Numerics.Fit.LineThroughOrigin([.. counts.Select(c => (double)c)], [.. integrals]);
        if (refined > 0 && double.IsFinite(refined)) unitsPerProton = refined;
        var worst = 0.0;
        for (var i = 0; i < counts.Length; i++)
        {
            worst = Math.Max(worst, Math.Abs((integrals[i] / unitsPerProton) - counts[i]));
        }

        return new IntegralFit(counts, unitsPerProton, worst);
    }
}
