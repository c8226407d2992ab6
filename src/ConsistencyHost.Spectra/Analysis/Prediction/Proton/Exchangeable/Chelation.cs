using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Exchangeable;

/// <summary>
/// Detects a six-membered intramolecular hydrogen bond: the X–H sits on an sp2 carbon whose neighbour carries a C=O,
/// C=N or NO2 (salicylaldehyde OH 11.0, 2-hydroxyacetophenone OH 12.3, acetylacetone enol 15.5, 2-nitroaniline NH2
/// 6.1, enaminone NH 9–12; from memory of Pretsch, Bühlmann &amp; Badertscher 2009).
/// </summary>
internal static class Chelation
{
    /// <summary>True when an sp2 neighbour of <paramref name="carbon"/> carries a hydrogen-bond acceptor group.</summary>
    public static bool HasAcceptorNextTo(PredictionContext context, int carbon)
    {
        foreach (var n in context.Molecule.Neighbours(carbon))
        {
            if (!AtomFacts.IsPiCarbon(context, n))
            {
                continue;
            }

            foreach (var g in context.Molecule.Neighbours(n))
            {
                if (g != carbon && !context.IsAromaticBond(n, g) && IsAcceptor(context, g))
                {
                    return true;
                }
            }
        }

        return false;
    }

    private static bool IsAcceptor(PredictionContext context, int atom)
    {
        var a = context.Molecule.Atoms[atom];
        return (a.AtomicNumber == 6 && !context.IsAromatic(atom) && (AtomFacts.IsCarbonylCarbon(context, atom) || AtomFacts.DoubleBondsTo(context, atom, 7) > 0))
            || (a.AtomicNumber == 7 && AtomFacts.DoubleBondsTo(context, atom, 8) > 0);
    }
}
