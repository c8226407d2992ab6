using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// The lower side of the n+1 check: a first-order pattern with fewer splittings than the couplings of its
/// protons that cannot vanish (an OCH2 next to a CH3 reported as a t, an isopropyl CH as a q). Couplings that
/// may be unresolved (meta, allylic, ring vicinal in a fused or five-membered ring, to OH/NH) never count, and a partner closer than
/// <see cref="StrongCouplingRatio"/> times the coupling makes the pair second order (A2B2 can look like a singlet), so it is skipped.
/// </summary>
internal static class TreePatternCheck
{
    /// <summary>
    /// A partner closer than this many times the coupling (Δν/J, both in Hz) makes the pair strongly coupled: its
    /// lines may merge or lean so far that the reported pattern is a fair reading of a second-order multiplet (an
    /// A2B2 can look like a singlet). Line counts hold well above it (common practice: first order from Δν/J ≈ 10,
    /// recognisable n+1 patterns with roofing down to about 3).
    /// </summary>
    private const double StrongCouplingRatio = 3;

    /// <summary>Observe frequency assumed when a list does not state it: low for today's instruments, so the cut is generous.</summary>
    private const double AssumedFrequencyMHz = 300;

    public static IEnumerable<Finding> Check(PartnerContext context)
    {
        foreach (var (s, _, cls) in TreeSignals.Of(context))
        {
            var signal = context.Spectrum.Signals[s];
            if (PatternReading.ImpliedCoupledProtons(signal.MultiplicityPattern) is not { } implied) continue;
            var tree = context.Trees![cls];
            var forced = tree.ForcedLinks.ToList();
            var needed = forced.Sum(l => l.Count);
            if (implied >= needed || AnyLookAlikeAllows(context, cls, implied, signal.CentrePpm) || !AllFirstOrder(context, signal.CentrePpm, forced)) continue;
            yield return Finding(context, s, cls, implied, needed, forced, tree);
        }
    }

    /// <summary>
    /// True when another class of the same size allows the pattern and could as well be the one at this shift:
    /// the assignment is chosen on counts and patterns first, so two look-alike classes (an aldehyde CH and an
    /// aromatic CH) may be swapped; judge only what no plausible swap explains. A look-alike is plausible here
    /// when the signal lies in its predicted window and putting it here (and the judged class where the
    /// look-alike sits) fits the predicted shifts nearly as well as the assignment does.
    /// </summary>
    private static bool AnyLookAlikeAllows(PartnerContext context, int cls, int implied, double shift)
    {
        var classes = context.Equivalence!.HydrogenClasses;
        var windows = context.HydrogenWindows;
        var size = classes[cls].ParentAtoms.Length;
        for (var c = 0; c < classes.Length; c++)
        {
            if (c == cls || classes[c].IsExchangeable || classes[c].ParentAtoms.Length != size || context.Trees![c].ForcedPartners > implied) continue;
            if (windows is null || PlausibleSwap(context, windows, cls, c, shift)) return true;
        }

        return false;
    }

    /// <summary>
    /// Window slack (ppm) and how much worse (ppm of distance from the most likely shifts) a swap may fit and still
    /// count as plausible: the increment methods' typical error for 1H (Pretsch; docs/spectrum-model.md).
    /// </summary>
    private const double SwapSlackPpm = 0.3;

    private static bool PlausibleSwap(PartnerContext context, IReadOnlyList<ShiftPrediction> windows, int judged, int lookAlike, double shift)
    {
        if (windows[lookAlike].Window.Widened(SwapSlackPpm).DistanceOutside(shift) > 0) return false;
        if (TreeSignals.SignalOf(context, lookAlike) is not { } held) return true;
        // The swap explains nothing when the judged class would break the look-alike's own signal in turn (a class
        // with two forced partners moved onto the other 'd').
        if (PatternReading.ImpliedCoupledProtons(held.MultiplicityPattern) is { } impliedThere && TreeSignals.HoldsOnlyClass(context, held, lookAlike)
            && impliedThere < context.Trees![judged].ForcedPartners)
        {
            return false;
        }

        var other = held.CentrePpm;
        var asAssigned = Distance(windows[judged], shift) + Distance(windows[lookAlike], other);
        var swapped = Distance(windows[lookAlike], shift) + Distance(windows[judged], other);
        return swapped <= asAssigned + SwapSlackPpm;
    }

    private static double Distance(ShiftPrediction prediction, double shift) => Math.Abs(shift - prediction.Window.MostLikely);

    private static bool AllFirstOrder(PartnerContext context, double shift, List<CouplingLink> forced)
    {
        var frequency = context.Spectrum.FrequencyMHz is { } stated and > 0 ? stated : AssumedFrequencyMHz;
        foreach (var link in forced)
        {
            if (link.IsHeteronuclear) continue; // a 19F/31P partner has no 1H shift: its splitting is first order
            if (TreeSignals.DistanceTo(context, link.PartnerClass, shift) is not { } apart) return false;
            var typicalJ = (link.Range.LowHz + link.Range.HighHz) / 2;
            if (apart * frequency < StrongCouplingRatio * typicalJ) return false;
        }

        return true;
    }

    private static Finding Finding(PartnerContext context, int s, int cls, int implied, int needed, List<CouplingLink> forced, CouplingTree tree)
    {
        var signal = context.Spectrum.Signals[s];
        var (firstOrder, merged) = tree.ExpectedPattern();
        var expected = merged is null ? $"'{firstOrder}'" : $"'{firstOrder}' (or '{merged}' when the J values are equal)";
        var types = string.Join(", ", forced.Select(l => $"{l.Count} {(l.IsHeteronuclear ? "F/P" : "H")} {Describe(l.Type)} ({l.Range.LowHz:0.#}–{l.Range.HighHz:0.#} Hz)"));
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
        CouplingType.VicinalRingAveraged => "vicinal (ring, averaged by inversion)",
        CouplingType.HF3JAromaticOrtho => "H–F ortho",
        CouplingType.HF2J => "geminal H–F",
        _ => type.ToString(),
    };
}
