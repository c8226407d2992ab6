using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>Ortho effects in fused six-membered rings scale with the bond between the two carbons.</summary>
internal static class FusedRingBonds
{
    /// <summary>
    /// In fused six-membered rings an ortho effect follows the bond order (naphthalene C1–C2 high, C2–C3 low):
    /// 2-naphthol C-1 109.5 (−18.5 from 128.0), C-3 117.7 (−8.2 from 125.9); 1-naphthol C-2 108.7, C-8a 124.4, against
    /// −12.8 on benzene (from memory): ×1.4 across an α–β bond, ×0.65 across β–β, ×0.7 to or from a fusion carbon.
    /// </summary>
    public static double OrthoScale(PredictionContext context, int carbon, int substituted)
    {
        var facts = AromaticFacts.Of(context);
        if (facts.SystemSize[carbon] < 10 || facts.RingSize[carbon] != 6)
        {
            return 1.0;
        }

        if (IsFusion(context, carbon) || IsFusion(context, substituted))
        {
            return 0.7;
        }

        return NextToFusion(context, carbon) || NextToFusion(context, substituted) ? 1.4 : 0.65;
    }

    private static bool IsFusion(PredictionContext context, int atom) => RingFacts.Of(context).RingCount[atom] >= 2;

    private static bool NextToFusion(PredictionContext context, int atom)
    {
        foreach (var x in context.Molecule.Neighbours(atom))
        {
            if (context.IsAromatic(x) && context.IsAromaticBond(atom, x) && IsFusion(context, x))
            {
                return true;
            }
        }

        return false;
    }
}
