using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// A reported H–H J larger than every coupling type the structure gives the signal's protons (16 Hz where the
/// only vinyl partner is cis; 8 Hz where the only partners are meta). Judged conservatively: not when the
/// structure holds 19F or 31P (their J may be the one reported), and not when another class of the same size
/// could explain the J (the solver may have swapped two look-alike classes).
/// </summary>
internal static class TreeJCheck
{
    /// <summary>Allowance beyond the table's largest value, Hz: rounding, averaging of near-equal J, and unusual substituents (common practice).</summary>
    private const double ToleranceHz = 1.5;

    public static IEnumerable<Finding> Check(PartnerContext context)
    {
        if (context.MayCoupleToHeteronucleus()) yield break;
        foreach (var (s, _, cls) in TreeSignals.Of(context))
        {
            var signal = context.Spectrum.Signals[s];
            var pattern = signal.MultiplicityPattern;
            if (!pattern.IsFirstOrder || pattern.IsBroad || pattern.IsApparent || signal.Couplings.Count == 0) continue;
            var tree = context.Trees![cls];
            if (tree.Links.Count == 0) continue;
            var largest = tree.LargestJHz;
            foreach (var coupling in signal.Couplings)
            {
                if (coupling.IsHeteronuclear || coupling.Hz <= largest + ToleranceHz || AnyLookAlikeExplains(context, cls, coupling.Hz)) continue;
                yield return Finding(context, s, cls, coupling.Hz, tree);
                break;
            }
        }
    }

    private static bool AnyLookAlikeExplains(PartnerContext context, int cls, double hz)
    {
        var classes = context.Equivalence!.HydrogenClasses;
        var size = classes[cls].ParentAtoms.Length;
        for (var c = 0; c < classes.Length; c++)
        {
            if (c != cls && classes[c].ParentAtoms.Length == size && context.Trees![c].LargestJHz + ToleranceHz >= hz) return true;
        }

        return false;
    }

    private static Finding Finding(PartnerContext context, int s, int cls, double hz, CouplingTree tree)
    {
        var signal = context.Spectrum.Signals[s];
        var types = string.Join(", ", tree.Links.Select(l => $"{TreePatternCheck.Describe(l.Type)} {l.Range.LowHz:0.#}–{l.Range.HighHz:0.#} Hz"));
        var text = string.Create(CultureInfo.InvariantCulture,
            $"The signal at {signal.Describe()} reports J = {hz} Hz, larger than any coupling its protons have in this structure ({types}).");
        return new Finding(CouplingPartnersCodes.JOutsideCouplingTypes, Severity.Warning, text)
            {
                Peaks = [new PeakRef(context.SpectrumIndex, s)],
                Atoms = [.. context.Equivalence!.HydrogenClasses[cls].ParentAtoms.Distinct()],
            }
            .WithEvidence("j_hz", hz).WithEvidence("largest_expected_hz", tree.LargestJHz);
    }
}
