using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>
/// Reads a 1H list against a structure. Signals that sit on residual solvent, water or an impurity are
/// candidates for not being the compound's; the reading that the assignment solver explains best wins, and
/// on a tie every signal stays the compound's (a chemist's reported signal is not discarded lightly).
/// </summary>
public static class ProtonInterpreter
{
    /// <summary>Interprets <paramref name="spectrum"/> for <paramref name="molecule"/>.</summary>
    /// <param name="spectrum">The 1H list.</param>
    /// <param name="molecule">The structure.</param>
    /// <param name="equivalence">Its perceived classes.</param>
    /// <param name="matchOptions">Residual windows (defaults when null).</param>
    /// <param name="hydrogenWindows">
    /// The predicted window of each hydrogen class (in class order) in the spectrum's solvent: among assignments
    /// equal on counts and patterns, the one whose shifts fit them best is kept (<see cref="ShiftPreference"/>).
    /// Null: the solver's first choice stands.
    /// </param>
    public static ProtonInterpretation Interpret(Spectrum spectrum, Molecule molecule, NmrEquivalence equivalence, ResidualMatchOptions? matchOptions = null,
        IReadOnlyList<ShiftPrediction>? hydrogenWindows = null)
    {
        ArgumentNullException.ThrowIfNull(spectrum);
        var fast = ClassInputs.From(equivalence);
        var splits = AmideRotation.Splits(molecule, equivalence).Hydrogen;
        var residuals = new ResidualMatcher(matchOptions).Match(spectrum);
        var minor = spectrum.Signals.Select(s => s.IsMinorSpecies()).ToArray();
        var rotamerPairs = RotamerShares.Pair(spectrum.Signals, minor);
        var stated = RotamerShares.Summed(spectrum.Signals, rotamerPairs);
        var (counts, fit) = ProtonCounts(spectrum.Signals, stated, minor, fast);
        var candidates = Candidates(residuals, spectrum.Signals, molecule, minor, stated, counts);
        var best = Choose(spectrum.Signals, counts, minor, candidates, fast, hydrogenWindows);
        var classes = fast;
        if (splits.Count > 0 && !IsPerfect(best))
        {
            // Slow amide rotation is a second reading of the structure; it must explain the data strictly better.
            var slow = ClassInputs.Split(fast, splits.Select(s => s.ClassIndex));
            var slowBest = Choose(spectrum.Signals, counts, minor, candidates, slow, hydrogenWindows, best.Cost);
            if (slowBest.Cost < best.Cost - 1e-9)
            {
                (best, classes) = (slowBest, slow);
            }
        }
        var assignment = best.Assignment;
        if (assignment is not null && best.Inputs is { } inputs && best.ShiftCost is { } misfit)
        {
            assignment = ShiftPreference.Refine(classes, inputs, assignment, (c, k) => misfit[c, k]);
        }

        var roles = new SignalRole[spectrum.Signals.Count];
        for (var i = 0; i < roles.Length; i++)
        {
            roles[i] = minor[i] ? SignalRole.MinorSpecies : best.Removed.TryGetValue(i, out var role) ? role : SignalRole.Compound;
        }

        return new ProtonInterpretation
        {
            Roles = roles,
            ProtonCounts = counts,
            CompoundSignals = best.Kept,
            Classes = classes,
            Assignment = assignment,
            IntegralFit = fit,
            Residuals = residuals,
            SlowAmideRotation = !ReferenceEquals(classes, fast),
            StatedCounts = stated,
            RotamerPairs = rotamerPairs,
        };
    }


    /// <summary>
    /// A signal the author integrated to this many protons or more is the compound's, never water: a water trace is
    /// one exchange-averaged line that authors leave unintegrated or integrate to a fraction or to 2 H (its
    /// H2O), while a 3 H or 9 H singlet in the water window is a methyl or tert-butyl group (common practice).
    /// Reading such a line as water would hide a wrong structure behind a water warning. A list of raw integrals
    /// (no stated counts) is judged by the counts the integral scale gives it.
    /// </summary>
    private const double MinCompoundCountNotWater = 2.5;

    /// <summary>Signals that may not be the compound's, each with the role it would have.</summary>
    private static Dictionary<int, SignalRole> Candidates(ResidualMatchResult residuals, IReadOnlyList<Signal> signals, Molecule molecule, bool[] minor, double?[] stated,
        int?[] counts)
    {
        var selfImpurities = residuals.Impurities.Where(e => SameCompound.Is(molecule, e.Impurity.Smiles)).Select(e => e.Impurity.Name).ToHashSet(StringComparer.Ordinal);
        var credible = residuals.Impurities.Where(e => e.MeetsMinimum).Select(e => e.Impurity.Name).ToHashSet(StringComparer.Ordinal);
        var result = new Dictionary<int, SignalRole>();
        foreach (var match in residuals.Matches)
        {
            if (minor[match.SignalIndex] || result.ContainsKey(match.SignalIndex)) continue;
            if (!ResidualShape.Fits(signals[match.SignalIndex], match)) continue;
            if (match.Kind == ResidualMatchKind.Water && (stated[match.SignalIndex] ?? counts[match.SignalIndex]) >= MinCompoundCountNotWater) continue;
            var role = match.Kind switch
            {
                ResidualMatchKind.ResidualSolvent => SignalRole.ResidualSolvent,
                ResidualMatchKind.Water => SignalRole.Water,
                _ when credible.Contains(match.Name) && !selfImpurities.Contains(match.Name) => SignalRole.Impurity,
                _ => SignalRole.Compound,
            };
            if (role != SignalRole.Compound) result[match.SignalIndex] = role;
        }

        return result;
    }

    private static (int?[] Counts, IntegralFit? Fit) ProtonCounts(IReadOnlyList<Signal> signals, double?[] stated, bool[] minor, IReadOnlyList<ClassInput> classes)
    {
        // Stated counts with rotamer shares already summed, so a 5.4 H + 3.6 H pair is 9 H, never 5 H.
        var counts = stated.Select(n => n is { } v ? (int?)(int)Math.Round(v) : null).ToArray();
        var counted = Enumerable.Range(0, signals.Count).Where(i => !minor[i]).ToList();
        if (counted.All(i => counts[i] is not null) || !counted.All(i => signals[i].Integral is > 0))
        {
            return (counts, null);
        }

        var total = classes.Sum(c => c.Size);
        var exchangeable = classes.Where(c => c.IsExchangeable).Sum(c => c.Size);
        var fit = IntegralScale.Fit([.. counted.Select(i => signals[i].Integral!.Value)], Math.Max(1, total - exchangeable), Math.Max(1, total + 2));
        if (fit is null) return (counts, null);
        for (var k = 0; k < counted.Count; k++) counts[counted[k]] = fit.Counts[k];
        return (counts, fit);
    }

    private sealed record Reading(List<int> Kept, Dictionary<int, SignalRole> Removed, AssignmentResult? Assignment, double Cost,
        List<SignalInput>? Inputs = null, double[,]? ShiftCost = null);

    private static Reading Choose(IReadOnlyList<Signal> signals, int?[] counts, bool[] minor, Dictionary<int, SignalRole> candidates, IReadOnlyList<ClassInput> classes,
        IReadOnlyList<ShiftPrediction>? windows, double bound = double.PositiveInfinity)
    {
        // Fewest removed first, so that a later reading must be strictly cheaper to win and its search can be
        // bounded by the best cost so far.
        var options = new List<Dictionary<int, SignalRole>> { new() };
        if (candidates.Count is > 1 and <= 8)
        {
            options.AddRange(candidates.Select(c => new Dictionary<int, SignalRole> { [c.Key] = c.Value }));
        }

        if (candidates.Count > 0) options.Add(candidates);
        Reading? best = null;
        foreach (var removed in options)
        {
            var reading = Evaluate(signals, counts, minor, removed, classes, windows, Math.Min(bound, best?.Cost ?? double.PositiveInfinity));
            if (best is null || reading.Cost < best.Cost - 1e-9 || (Math.Abs(reading.Cost - best.Cost) <= 1e-9 && reading.Removed.Count < best.Removed.Count))
            {
                best = reading;
            }

            // Costs are never negative, so nothing can beat a zero-cost reading that removes nothing; the other
            // readings' searches are skipped (each can run to the node budget, ~0.1 s, when it has no zero-cost
            // assignment: measured by bench/, see docs/benchmarks.md).
            if (IsPerfect(best)) break;
        }

        return best!;
    }

    /// <summary>Zero cost with every signal kept: the best any reading can be (costs are non-negative).</summary>
    private static bool IsPerfect(Reading reading) => reading.Cost <= 0 && reading.Removed.Count == 0;

    private static Reading Evaluate(IReadOnlyList<Signal> signals, int?[] counts, bool[] minor, Dictionary<int, SignalRole> removed, IReadOnlyList<ClassInput> classes,
        IReadOnlyList<ShiftPrediction>? windows, double bound)
    {
        var kept = Enumerable.Range(0, signals.Count).Where(i => !minor[i] && !removed.ContainsKey(i)).ToList();
        if (kept.Any(i => counts[i] is null))
        {
            // Without counts only the number of signals can speak: a surplus over the classes is better explained
            // by the candidates.
            var surplus = Math.Max(0, kept.Count - classes.Count);
            return new Reading(kept, removed, null, surplus);
        }

        var inputs = kept.Select(i => new SignalInput(counts[i]!.Value, PatternReading.ImpliedCoupledProtons(signals[i].MultiplicityPattern))).ToList();
        var shiftCost = windows is null ? null : ShiftFit.Matrix(classes, signals, kept, windows);
        var assignment = AssignmentSolver.Solve(classes, inputs, null, bound, shiftCost);
        return new Reading(kept, removed, assignment, assignment.Cost, inputs, shiftCost);
    }
}
