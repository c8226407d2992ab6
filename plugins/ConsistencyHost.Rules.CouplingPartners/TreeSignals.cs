using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// The signals a coupling-tree check may judge: compound signals the best assignment gives exactly one
/// non-exchangeable hydrogen class, when that assignment matches every proton count (as in
/// <see cref="PatternFeasibility"/>). Overlapping classes, exchangeable protons and uncertain assignments are
/// left alone: their patterns are not a first-order reading of one class.
/// </summary>
internal static class TreeSignals
{
    /// <summary>(signal index, position in CompoundSignals, structure class index) of each judged signal.</summary>
    public static IEnumerable<(int Signal, int Position, int Class)> Of(PartnerContext context)
    {
        if (context.Interpretation is not { Assignment: { } assignment } interpretation || !PatternFeasibility.CountsMatch(interpretation, assignment)) yield break;
        if (context.Trees is not { } trees || context.Equivalence is not { } equivalence) yield break;
        for (var k = 0; k < context.CompoundSignals.Count; k++)
        {
            if (assignment.ClassesBySignal[k].Count != 1) continue;
            var input = interpretation.Classes[assignment.ClassesBySignal[k][0]];
            if (input.IsExchangeable || input.Source < 0 || input.Source >= trees.Count) continue;
            if (equivalence.HydrogenClasses[input.Source].IsDiastereotopic) continue;
            yield return (context.CompoundSignals[k], k, input.Source);
        }
    }

    /// <summary>True when <paramref name="signal"/> holds <paramref name="structureClass"/> and no other class.</summary>
    public static bool HoldsOnlyClass(PartnerContext context, Signal signal, int structureClass)
    {
        var interpretation = context.Interpretation!;
        var assignment = interpretation.Assignment!;
        for (var k = 0; k < context.CompoundSignals.Count; k++)
        {
            if (!ReferenceEquals(context.Spectrum.Signals[context.CompoundSignals[k]], signal)) continue;
            var held = assignment.ClassesBySignal[k];
            return held.Count == 1 && interpretation.Classes[held[0]].Source == structureClass;
        }

        return false;
    }

    /// <summary>The centre shift of the signal holding structure class <paramref name="structureClass"/>; null when none holds it.</summary>
    public static double? ShiftOf(PartnerContext context, int structureClass) => SignalOf(context, structureClass)?.CentrePpm;

    /// <summary>
    /// How far (ppm) the signal holding <paramref name="structureClass"/> lies from <paramref name="shift"/>: from
    /// its nearest end when it is a reported range; null when no signal holds the class.
    /// </summary>
    public static double? DistanceTo(PartnerContext context, int structureClass, double shift)
    {
        if (SignalOf(context, structureClass) is not { } signal) return null;
        var (low, high) = (signal.RangeLowPpm ?? signal.CentrePpm, signal.RangeHighPpm ?? signal.CentrePpm);
        return shift < low ? low - shift : shift > high ? shift - high : 0;
    }

    /// <summary>The signal holding structure class <paramref name="structureClass"/>; null when none holds it.</summary>
    public static Signal? SignalOf(PartnerContext context, int structureClass)
    {
        var interpretation = context.Interpretation!;
        var assignment = interpretation.Assignment!;
        for (var k = 0; k < context.CompoundSignals.Count; k++)
        {
            foreach (var c in assignment.ClassesBySignal[k])
            {
                if (interpretation.Classes[c].Source == structureClass) return context.Spectrum.Signals[context.CompoundSignals[k]];
            }
        }

        return null;
    }
}
