using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Substituents on ring nitrogen (N-alkyl, N-aryl, N-acyl, N-sulfonyl, N-Boc azoles) are no benzene substituents;
/// they widen the windows of ring carbons up to two bonds away instead.
/// </summary>
/// <remarks>From memory (Pretsch et al. 2009): N-methylindole C-2 128.8 (+4.6), C-7 109.2 (−1.9); N-acetylindole
/// C-3 109.0 (+6.4), C-7 116.5 (+5.4); N-Boc and N-tosyl pyrroles and indoles similar to N-acetyl.</remarks>
internal static class RingNitrogenSubstituents
{
    /// <summary>Widens <paramref name="estimate"/> for substituted ring nitrogens near aromatic carbon <paramref name="carbon"/>.</summary>
    public static void Widen(PredictionContext context, int carbon, CarbonEstimate estimate)
    {
        var m = context.Molecule;
        foreach (var a in m.Neighbours(carbon))
        {
            if (!InSystem(context, carbon, a))
            {
                continue;
            }

            Check(context, a, estimate);
            foreach (var b in m.Neighbours(a))
            {
                if (b != carbon && InSystem(context, a, b) && m.BondBetween(carbon, b) < 0)
                {
                    Check(context, b, estimate);
                }
            }
        }
    }

    private static bool InSystem(PredictionContext context, int from, int to) => context.IsAromatic(to) && context.IsAromaticBond(from, to);

    private static void Check(PredictionContext context, int atom, CarbonEstimate estimate)
    {
        var m = context.Molecule;
        if (m.Atoms[atom].AtomicNumber != Topology.Nitrogen || m.Degree(atom) < 3 || m.Atoms[atom].Charge != 0)
        {
            return;
        }

        foreach (var x in m.Neighbours(atom))
        {
            if (InSystem(context, atom, x))
            {
                continue;
            }

            var group = GroupClassifier.Classify(context, atom, x);
            var withdrawing = group is Group.Acyl or Group.Formyl or Group.Ester or Group.Amide or Group.Sulfonyl or Group.Thioacyl;
            estimate.Widen(withdrawing ? 4.5 : 2.5);
        }
    }
}
