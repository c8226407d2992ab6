using System.Collections.Immutable;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>
/// Downfield allowances the ring-position tables do not carry: a substituent in the peri position across a ring
/// fusion (1-substituted naphthalenes, H-5 of 4-substituted quinolines: +0.2 to +0.5), and the carbonyl or sulfonyl
/// of an N-acyl/N-sulfonyl azole, whose anisotropy moves H-2 and H-7 of 1-acylindoles to 8.4–8.5 (from memory of
/// Pretsch, Bühlmann &amp; Badertscher 2009).
/// </summary>
internal static class FusedRingAllowances
{
    /// <summary>Stretches the window upward where either effect applies.</summary>
    public static void Apply(PredictionContext context, ImmutableArray<int> ring, int index, ProtonEstimate estimate)
    {
        if (HasPeriSubstituent(context, ring, ring[index]))
        {
            estimate.Stretch(0.1, 0.4, "peri substituent across the ring fusion: up to +0.40");
        }

        if (NearAcylatedRingNitrogen(context, ring[index]))
        {
            estimate.Stretch(0, 0.9, "N-acyl/N-sulfonyl ring nitrogen nearby: up to +0.90");
        }
    }

    private static bool HasPeriSubstituent(PredictionContext context, ImmutableArray<int> ring, int atom)
    {
        foreach (var fusion in context.Molecule.Neighbours(atom))
        {
            var across = ring.Contains(fusion) ? AromaticRing.FusedPartner(context, ring, fusion) : -1;
            if (across >= 0 && HasExocyclicSingleBondedGroup(context, across, fusion))
            {
                return true;
            }
        }

        return false;
    }

    private static bool HasExocyclicSingleBondedGroup(PredictionContext context, int atom, int except)
    {
        var m = context.Molecule;
        foreach (var n in m.Neighbours(atom))
        {
            if (n != except && !context.IsAromaticBond(atom, n) && m.Bonds[m.BondBetween(atom, n)].Order == 1)
            {
                return true;
            }
        }

        return false;
    }

    private static bool NearAcylatedRingNitrogen(PredictionContext context, int atom)
    {
        Span<int> frontier = stackalloc int[16];
        Span<int> next = stackalloc int[16];
        frontier[0] = atom;
        var count = 1;
        for (var step = 0; step < 3 && count > 0; step++)
        {
            var nextCount = 0;
            for (var f = 0; f < count; f++)
            {
                foreach (var n in context.Molecule.Neighbours(frontier[f]))
                {
                    if (!context.IsAromaticBond(frontier[f], n)) continue;
                    if (IsAcylatedNitrogen(context, n)) return true;
                    if (nextCount < next.Length) next[nextCount++] = n;
                }
            }

            next[..nextCount].CopyTo(frontier);
            count = nextCount;
        }

        return false;
    }

    private static bool IsAcylatedNitrogen(PredictionContext context, int atom)
    {
        if (context.Molecule.Atoms[atom].AtomicNumber != 7) return false;
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (!context.IsAromaticBond(atom, n)
                && (AtomFacts.IsCarbonylCarbon(context, n) || (context.Molecule.Atoms[n].AtomicNumber == 16 && AtomFacts.DoubleBondsTo(context, n, 8) >= 2)))
            {
                return true;
            }
        }

        return false;
    }
}
