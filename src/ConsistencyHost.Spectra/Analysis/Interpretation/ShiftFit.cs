using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>
/// How poorly a hydrogen class fits a reported signal by shift, for <see cref="ShiftPreference"/>: the distance
/// from the class's most likely shift to the signal (its centre, or its reported range), plus a heavier
/// charge for every ppm outside the class's window.
/// </summary>
internal static class ShiftFit
{
    /// <summary>Each ppm outside the window counts this many times a ppm inside it.</summary>
    private const double OutsideWeight = 3;

    /// <summary>The misfit of every solver class (row) at every kept signal (column).</summary>
    /// <param name="classes">The solver's classes (each names its structure class as Source).</param>
    /// <param name="signals">The reported signals.</param>
    /// <param name="kept">The compound signals the solver's signal k stands for.</param>
    /// <param name="windows">The window of each structure hydrogen class.</param>
    public static double[,] Matrix(IReadOnlyList<ClassInput> classes, IReadOnlyList<Signal> signals, IReadOnlyList<int> kept, IReadOnlyList<ShiftPrediction> windows)
    {
        var cost = new double[classes.Count, kept.Count];
        for (var k = 0; k < kept.Count; k++)
        {
            var signal = signals[kept[k]];
            var (low, high) = signal.ShiftPpm is { } shift ? (shift, shift) : (signal.RangeLowPpm ?? signal.CentrePpm, signal.RangeHighPpm ?? signal.CentrePpm);
            for (var c = 0; c < classes.Count; c++)
            {
                var source = classes[c].Source;
                if (source < 0 || source >= windows.Count) continue;
                var window = windows[source].Window;
                var fromMostLikely = window.MostLikely < low ? low - window.MostLikely : window.MostLikely > high ? window.MostLikely - high : 0;
                cost[c, k] = fromMostLikely + OutsideWeight * window.DistanceOutside(low, high);
            }
        }

        return cost;
    }
}
