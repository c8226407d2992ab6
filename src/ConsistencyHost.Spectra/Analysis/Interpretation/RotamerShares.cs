using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>
/// Rotamer (or other slowly exchanging) mixtures reported with each species' share of an environment as a
/// fractional integral: "1.49 (s, 5.4H, major), 1.46 (s, 3.6H, minor)" is one 9 H environment seen twice
/// (common practice). Each minor-noted signal with a fractional count is paired with the nearest unpaired
/// non-minor signal whose fractional count it completes to a whole number; the pair counts once, as the sum.
/// Linear in the number of fractional signals times minor signals (both a handful): no search.
/// </summary>
public static class RotamerShares
{
    /// <summary>How far from a whole number a count may be and still be whole (reported to one decimal).</summary>
    private const double WholeTolerance = 0.06;

    /// <summary>Minor signal index → the non-minor signal it shares an environment with.</summary>
    public static IReadOnlyDictionary<int, int> Pair(IReadOnlyList<Signal> signals, IReadOnlyList<bool> minor)
    {
        ArgumentNullException.ThrowIfNull(signals);
        ArgumentNullException.ThrowIfNull(minor);
        var pairs = new Dictionary<int, int>();
        var taken = new HashSet<int>();
        for (var m = 0; m < signals.Count; m++)
        {
            if (!minor[m] || !IsFractional(signals[m].ProtonCount)) continue;
            var best = -1;
            for (var j = 0; j < signals.Count; j++)
            {
                if (minor[j] || taken.Contains(j) || !IsFractional(signals[j].ProtonCount)) continue;
                if (!IsWhole(signals[m].ProtonCount!.Value + signals[j].ProtonCount!.Value)) continue;
                if (best < 0 || Distance(signals[j], signals[m]) < Distance(signals[best], signals[m])) best = j;
            }

            if (best < 0) continue;
            pairs[m] = best;
            taken.Add(best);
        }

        return pairs;
    }

    /// <summary>The count of every signal with its minor partners' shares added (null where none is stated).</summary>
    public static double?[] Summed(IReadOnlyList<Signal> signals, IReadOnlyDictionary<int, int> pairs)
    {
        ArgumentNullException.ThrowIfNull(signals);
        ArgumentNullException.ThrowIfNull(pairs);
        var sums = signals.Select(s => s.ProtonCount).ToArray();
        foreach (var (m, major) in pairs) sums[major] += signals[m].ProtonCount;
        return sums;
    }

    private static bool IsFractional(double? count) => count is { } n && !IsWhole(n);

    private static bool IsWhole(double n) => Math.Abs(n - Math.Round(n)) <= WholeTolerance;

    private static double Distance(Signal a, Signal b) => Math.Abs(a.CentrePpm - b.CentrePpm);
}
