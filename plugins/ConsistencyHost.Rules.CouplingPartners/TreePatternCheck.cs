using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// The lower side of the n+1 check: a first-order pattern with fewer splittings than the couplings of its
/// protons that cannot vanish (an OCH2 next to a CH3 reported as a t, an isopropyl CH as a q). Couplings that
/// may be unresolved (meta, allylic, ring vicinal, to OH/NH) never count, and a partner within
/// <see cref="SecondOrderPpm"/> makes the pair second order (A2B2 can look like a singlet), so it is skipped.
/// </summary>
internal static class TreePatternCheck
{
    /// <summary>
    /// Partners closer than this (ppm) may collapse the pattern (Δν/J small even at 600 MHz: 0.3 ppm = 180 Hz,
    /// but roofed AB-type patterns are routinely reported as simpler ones below that; common practice).
    /// </summary>
    private const double SecondOrderPpm = 0.3;

    public static IEnumerable<Finding> Check(PartnerContext context)
    {
        foreach (var (s, _, cls) in TreeSignals.Of(context))
        {
            var signal = context.Spectrum.Signals[s];
            if (PatternReading.ImpliedCoupledProtons(signal.MultiplicityPattern) is not { } implied) continue;
            var tree = context.Trees![cls];
            var forced = tree.Links.Where(l => !l.IsHeteronuclear && !l.Range.MayVanish && l.PartnerClass != cls).ToList();
            var needed = forced.Sum(l => l.Count);
            if (implied >= needed || AnyLookAlikeAllows(context, cls, implied) || !AllFirstOrder(context, signal.CentrePpm, forced)) continue;
            yield return Finding(context, s, cls, implied, needed, forced, tree);
        }
    }

    /// <summary>
    /// True when another class of the same size allows the pattern: the assignment is chosen on counts, so it may
    /// have swapped two look-alike classes (an aldehyde CH and an aromatic CH); judge only what no swap explains.
    /// </summary>
    private static bool AnyLookAlikeAllows(PartnerContext context, int cls, int implied)
    {
        var classes = context.Equivalence!.HydrogenClasses;
        var size = classes[cls].ParentAtoms.Length;
        for (var c = 0; c < classes.Length; c++)
        {
            if (c != cls && !classes[c].IsExchangeable && classes[c].ParentAtoms.Length == size && context.Trees![c].ForcedPartners <= implied) return true;
        }

        return false;
    }

    private static bool AllFirstOrder(PartnerContext context, double shift, List<CouplingLink> forced)
    {
        foreach (var link in forced)
        {
            if (TreeSignals.ShiftOf(context, link.PartnerClass) is not { } other || Math.Abs(other - shift) < SecondOrderPpm) return false;
        }

        return true;
    }

    private static Finding Finding(PartnerContext context, int s, int cls, int implied, int needed, List<CouplingLink> forced, CouplingTree tree)
    {
        var signal = context.Spectrum.Signals[s];
        var (firstOrder, merged) = tree.ExpectedPattern();
        var expected = merged is null ? $"'{firstOrder}'" : $"'{firstOrder}' (or '{merged}' when the J values are equal)";
        var types = string.Join(", ", forced.Select(l => $"{l.Count} H {Describe(l.Type)} ({l.Range.LowHz:0.#}–{l.Range.HighHz:0.#} Hz)"));
        var text = string.Create(CultureInfo.InvariantCulture,
            $"The signal at {signal.Describe()} is reported as '{signal.Multiplicity}' ({implied} coupled protons), but its protons couple to {types}, couplings that do not vanish: expected {expected}.");
        // A textbook n+1 case (freely rotating vicinal couplings) is an error; aromatic and vinyl patterns can be
        // distorted in ways a list does not show, so they are a warning.
        var severity = forced.All(l => l.Type == CouplingType.VicinalFreelyRotating) ? Severity.Error : Severity.Warning;
        return new Finding(CouplingPartnersCodes.PatternTooFewLines, severity, text)
            {
                Peaks = [new PeakRef(context.SpectrumIndex, s)],
                Atoms = [.. context.Equivalence!.HydrogenClasses[cls].ParentAtoms.Distinct()],
            }
            .WithEvidence("implied_partners", implied).WithEvidence("forced_partners", needed).WithEvidence("expected_pattern", firstOrder);
    }

    internal static string Describe(CouplingType type) => type switch
    {
        CouplingType.VicinalFreelyRotating => "vicinal",
        CouplingType.AromaticOrtho or CouplingType.AromaticOrthoNextToNitrogen => "aromatic ortho",
        CouplingType.AromaticMeta => "aromatic meta",
        CouplingType.VinylCis or CouplingType.VinylCisInSmallRing => "vinyl cis",
        CouplingType.VinylTrans => "vinyl trans",
        CouplingType.VinylCisOrTrans => "vinyl",
        CouplingType.GeminalSp3 or CouplingType.GeminalVinyl => "geminal",
        _ => type.ToString(),
    };
}
