using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// A first-order pattern that implies more coupled protons than any class in its signal can have. Judged on
/// the best assignment, and only when that assignment matches every proton count: the solver prefers any
/// feasible pattern, so a pattern left impossible there is impossible for every count-consistent assignment.
/// </summary>
internal static class PatternFeasibility
{
    public static IEnumerable<Finding> Check(PartnerContext context)
    {
        if (context.Interpretation is not { Assignment: { } assignment } interpretation || !CountsMatch(interpretation, assignment)) yield break;
        var signals = context.Spectrum.Signals;
        for (var k = 0; k < context.CompoundSignals.Count; k++)
        {
            var s = context.CompoundSignals[k];
            var classes = assignment.ClassesBySignal[k];
            if (classes.Count == 0 || PatternReading.ImpliedCoupledProtons(signals[s].MultiplicityPattern) is not { } implied) continue;
            var most = classes.Max(c => interpretation.Classes[c].MaxCoupledProtons);
            if (implied <= most) continue;
            var text = string.Create(CultureInfo.InvariantCulture,
                $"The signal at {signals[s].Describe()} is reported as '{signals[s].Multiplicity}', which needs {implied} coupled protons, but the protons it can belong to have at most {most} neighbours to couple with.");
            yield return new Finding(CouplingPartnersCodes.MultiplicityImpossible, Severity.Error, text) { Peaks = [new PeakRef(context.SpectrumIndex, s)] }
                .WithEvidence("implied_partners", implied).WithEvidence("max_partners", most);
        }
    }

    internal static bool CountsMatch(Spectra.Analysis.Interpretation.ProtonInterpretation interpretation, AssignmentResult assignment)
    {
        for (var k = 0; k < interpretation.CompoundSignals.Count; k++)
        {
            var expected = interpretation.ProtonCounts[interpretation.CompoundSignals[k]];
            if (assignment.ClassesBySignal[k].Sum(c => interpretation.Classes[c].Size) != expected) return false;
        }

        return assignment.MissingClasses.All(c => interpretation.Classes[c].IsExchangeable);
    }
}
