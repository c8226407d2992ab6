namespace ConsistencyHost.Spectra.Analysis.Assignment;

/// <summary>
/// Among assignments the solver cannot tell apart (same counts, same pattern costs), prefers the one whose
/// shifts fit the predicted windows: two classes of the same size on different signals are swapped whenever
/// the swap costs the solver nothing and moves both closer to their predicted shifts. The solver itself reads
/// only counts and patterns, so without this an aromatic CH and an aldehyde CH of one proton each are placed
/// in whatever order the search met them, and every later check reads the wrong class at each signal.
/// </summary>
/// <remarks>
/// Pairwise exchange until no swap improves (each accepted swap lowers a finite total, so it ends); at most
/// <see cref="MaxRounds"/> passes over the n² pairs keep the cost bounded for the largest entries (~40 classes).
/// </remarks>
public static class ShiftPreference
{
    /// <summary>Passes over all pairs at most; real entries settle in one or two.</summary>
    private const int MaxRounds = 4;

    /// <summary>A swap must gain this much (ppm-scaled cost) to count: ties keep the solver's order.</summary>
    private const double MinimumGain = 1e-6;

    /// <summary>
    /// The assignment with classes of equal size exchanged between signals wherever that lowers the total of
    /// <paramref name="shiftCost"/>(class, signal) without changing the solver's cost.
    /// </summary>
    /// <param name="classes">The classes the solver saw.</param>
    /// <param name="signals">The signals the solver saw.</param>
    /// <param name="result">The solver's best assignment over them.</param>
    /// <param name="shiftCost">How poorly class c fits signal s by shift (0 = at its most likely value); never negative.</param>
    /// <param name="options">The solver's weights (the pattern costs must be the ones it used).</param>
    public static AssignmentResult Refine(
        IReadOnlyList<ClassInput> classes, IReadOnlyList<SignalInput> signals, AssignmentResult result, Func<int, int, double> shiftCost, AssignmentOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(classes);
        ArgumentNullException.ThrowIfNull(signals);
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(shiftCost);
        options ??= AssignmentOptions.Default;
        var signalOf = new int[classes.Count];
        Array.Fill(signalOf, -1);
        for (var s = 0; s < result.ClassesBySignal.Count; s++)
        {
            foreach (var c in result.ClassesBySignal[s]) signalOf[c] = s;
        }

        var swapped = false;
        for (var round = 0; round < MaxRounds; round++)
        {
            var improved = false;
            for (var a = 0; a < classes.Count; a++)
            {
                for (var b = a + 1; b < classes.Count; b++)
                {
                    if (!Swappable(classes, signalOf, a, b)) continue;
                    var (sa, sb) = (signalOf[a], signalOf[b]);
                    var gain = shiftCost(a, sa) + shiftCost(b, sb) - shiftCost(a, sb) - shiftCost(b, sa);
                    if (gain <= MinimumGain || !PatternsNoWorse(classes, signals, signalOf, a, b, options)) continue;
                    (signalOf[a], signalOf[b]) = (sb, sa);
                    improved = swapped = true;
                }
            }

            if (!improved) break;
        }

        if (!swapped) return result;
        var bySignal = new List<int>[signals.Count];
        for (var s = 0; s < bySignal.Length; s++) bySignal[s] = [];
        for (var c = 0; c < signalOf.Length; c++)
        {
            if (signalOf[c] >= 0) bySignal[signalOf[c]].Add(c);
        }

        return result with { ClassesBySignal = bySignal };
    }

    private static bool Swappable(IReadOnlyList<ClassInput> classes, int[] signalOf, int a, int b) =>
        signalOf[a] >= 0 && signalOf[b] >= 0 && signalOf[a] != signalOf[b]
        && classes[a].Size == classes[b].Size && classes[a].IsExchangeable == classes[b].IsExchangeable;

    /// <summary>True when the two signals' pattern costs sum the same after the swap (counts are unchanged: equal sizes), so the solver's cost stands.</summary>
    private static bool PatternsNoWorse(IReadOnlyList<ClassInput> classes, IReadOnlyList<SignalInput> signals, int[] signalOf, int a, int b, AssignmentOptions options)
    {
        var (sa, sb) = (signalOf[a], signalOf[b]);
        var before = WorstPattern(classes, signals, signalOf, sa, options) + WorstPattern(classes, signals, signalOf, sb, options);
        (signalOf[a], signalOf[b]) = (sb, sa);
        var after = WorstPattern(classes, signals, signalOf, sa, options) + WorstPattern(classes, signals, signalOf, sb, options);
        (signalOf[a], signalOf[b]) = (sa, sb);
        return Math.Abs(after - before) <= 1e-12;
    }

    private static double WorstPattern(IReadOnlyList<ClassInput> classes, IReadOnlyList<SignalInput> signals, int[] signalOf, int signal, AssignmentOptions options)
    {
        var worst = 0.0;
        for (var c = 0; c < classes.Count; c++)
        {
            if (signalOf[c] == signal) worst = Math.Max(worst, PatternCost.Of(classes[c], signals[signal], options));
        }

        return worst;
    }
}
