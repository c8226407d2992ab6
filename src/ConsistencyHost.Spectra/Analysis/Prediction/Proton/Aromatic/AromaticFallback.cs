using System.Collections.Immutable;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>
/// Environment windows for aromatic C–H in rings no parent table covers (charged rings, pyridone-type rings,
/// unusual fused systems). Ranges: common practice, from memory of the heteroaromatic charts of Pretsch,
/// Bühlmann &amp; Badertscher 2009 (uracil H-5 5.45 to pyrimidinium and tetrazole CH above 9).
/// </summary>
internal static class AromaticFallback
{
    /// <summary>The environment window for the H on <paramref name="carbon"/> in <paramref name="ring"/> (may be empty).</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, ImmutableArray<int> ring, string? solvent)
    {
        var (low, high, likely, what) = Range(context, carbon, ring);
        var estimate = new ProtonEstimate().Start(likely, what + " (environment range)");
        estimate.Cover(low, "range from");
        estimate.Cover(high, "range to");
        AromaticShifts.ApplySolvent(estimate, solvent, heteroaromatic: true);
        return estimate.Finish(ShiftBasis.EnvironmentFallback);
    }

    private static (double Low, double High, double Likely, string What) Range(PredictionContext context, int carbon, ImmutableArray<int> ring)
    {
        if (ring.IsEmpty) return (5.5, 9.8, 7.3, "aromatic C–H");
        bool charged = false, pyridone = false, nextToHetero = false, nextToPyridineN = false;
        for (var k = 0; k < ring.Length; k++)
        {
            var a = ring[k];
            var atom = context.Molecule.Atoms[a];
            charged |= atom.Charge != 0;
            pyridone |= atom.AtomicNumber == 6 && AromaticRing.HasExocyclicDoubleBond(context, ring, a);
            var adjacent = context.Molecule.BondBetween(a, carbon) >= 0;
            nextToHetero |= adjacent && atom.AtomicNumber != 6;
            nextToPyridineN |= adjacent && AtomFacts.IsPyridineNitrogen(context, a);
        }

        if (charged) return (7.2, 10.0, 8.5, "C–H of a charged aromatic ring");
        if (pyridone) return (5.2, 8.8, 7.0, "C–H of a pyridone-type ring");
        if (ring.Length == 6) return nextToPyridineN ? (7.9, 9.8, 8.6, "six-ring C–H next to ring N") : (6.4, 8.9, 7.5, "six-ring C–H");
        if (ring.Length == 5) return nextToHetero ? (6.4, 9.4, 7.6, "five-ring C–H next to a heteroatom") : (5.8, 8.4, 6.9, "five-ring C–H");
        return (5.5, 9.8, 7.3, "aromatic C–H");
    }
}
