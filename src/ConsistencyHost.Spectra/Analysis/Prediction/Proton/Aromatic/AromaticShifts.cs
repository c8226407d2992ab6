using System.Collections.Immutable;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>
/// 1H window for an aromatic C–H: benzene 7.34 + Σ Z for benzenoid rings; the parent ring position + Σ Z (applied
/// approximately, wider) for heteroaromatics and fused rings; an environment window for rings no table knows.
/// </summary>
/// <remarks>
/// Half-width for benzenes 0.20 + 0.06 per substituent — increment estimates for mono- and disubstituted benzenes
/// fall within about 0.1–0.2 ppm of experiment (Pretsch, Bühlmann &amp; Badertscher 2009; toluene exact against
/// Gottlieb 1997) — plus crowding of neighbouring substituents (steric inhibition of resonance) and approximate rows.
/// Heteroaromatics: the parent's half-width + 0.08 per substituent + a quarter of Σ |Z| (benzene increments
/// transfer only roughly to heteroaromatic rings).
/// </remarks>
internal static class AromaticShifts
{
    /// <summary>The window for the hydrogen on aromatic carbon <paramref name="carbon"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, string? solvent)
    {
        var ring = AromaticRing.Of(context, carbon);
        if (ring.IsEmpty)
        {
            return AromaticFallback.Predict(context, carbon, ring, solvent);
        }

        var index = ring.IndexOf(carbon);
        if (ring.Length == 6 && AromaticRing.IsCarbocycle(context, ring) && !AromaticRing.IsFused(context, ring))
        {
            return Benzenoid(context, ring, index, solvent);
        }

        var parent = HeteroaromaticLookup.Find(RingPositionKey.Of(context, ring, index));
        return parent is null
            ? AromaticFallback.Predict(context, carbon, ring, solvent)
            : FromParent(context, ring, index, parent, solvent);
    }

    private static ShiftPrediction Benzenoid(PredictionContext context, ImmutableArray<int> ring, int index, string? solvent)
    {
        var estimate = new ProtonEstimate().Start(BenzeneIncrements.Base, "benzene base (Pretsch increments)");
        var outcome = RingSubstituents.Apply(context, ring, index, estimate);
        estimate.Widen(0.20, "increment error");
        if (outcome.Count > 0) estimate.Widen(0.06 * outcome.Count, outcome.Count, "substituents");
        if (outcome.Uncertainty > 0) estimate.Widen(outcome.Uncertainty, "approximate rows or crowding");
        ApplySolvent(estimate, solvent, heteroaromatic: false);
        return estimate.Finish(ShiftBasis.Increments);
    }

    private static ShiftPrediction FromParent(PredictionContext context, ImmutableArray<int> ring, int index, ParentPosition parent, string? solvent)
    {
        var estimate = new ProtonEstimate().Start(parent.Ppm, parent.Parent, parent.Source == 'M' ? " ring position (from memory)" : " ring position (Pretsch)");
        var outcome = RingSubstituents.Apply(context, ring, index, estimate);
        estimate.Widen(parent.HalfWidth, "parent value");
        if (outcome.Count > 0) estimate.Widen(0.08 * outcome.Count + 0.25 * outcome.SumAbsolute, "benzene increments transferred");
        if (outcome.Uncertainty > 0) estimate.Widen(outcome.Uncertainty, "approximate rows or crowding");
        FusedRingAllowances.Apply(context, ring, index, estimate);
        ApplySolvent(estimate, solvent, heteroaromatic: true);
        return estimate.Finish(outcome.Count > 0 ? ShiftBasis.Increments : ShiftBasis.TabulatedEnvironment);
    }

    private const double HeteroaromaticUp = 0.3;
    private const double BenzenoidUp = 0.2;
    private static readonly string HeteroaromaticStretch = ": −0.10/" + Ppm.Signed(HeteroaromaticUp) + " against CDCl3 data";
    private static readonly string BenzenoidStretch = ": −0.10/" + Ppm.Signed(BenzenoidUp) + " against CDCl3 data";

    /// <summary>Solvent allowance for aromatic protons (C6D6 upfield; polar solvents mostly downfield).</summary>
    internal static void ApplySolvent(ProtonEstimate estimate, string? solvent, bool heteroaromatic)
    {
        var up = heteroaromatic ? HeteroaromaticUp : BenzenoidUp;
        switch (solvent)
        {
            case "CDCl3" or "CD2Cl2":
                return;
            case "C6D6" or "toluene-d8":
                estimate.Stretch(0.4, 0.05, "aromatic solvent: up to −0.40");
                return;
            default:
                estimate.Stretch(0.1, up, solvent ?? "solvent not given", heteroaromatic ? HeteroaromaticStretch : BenzenoidStretch);
                return;
        }
    }
}
