using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Two oxygen or nitrogen donors on neighbouring ring carbons (catechol ethers, benzodioxoles) do not add up: the
/// ring CH carbons lie about 3 ppm lower than the sum, and every carbon of the ring is less certain.
/// </summary>
/// <remarks>From memory (Pretsch et al. 2009): 1,2-dimethoxybenzene C-3 111.5 (sum 115.1), 1,3-benzodioxole C-4
/// 108.7 (sum 115.1), veratrole C-1 149.1 (sum 145.5).</remarks>
internal static class OrthoDonors
{
    /// <summary>Applies the correction to aromatic carbon <paramref name="carbon"/> when its ring holds such a pair.</summary>
    public static void Apply(PredictionContext context, int carbon, CarbonEstimate estimate)
    {
        var facts = AromaticFacts.Of(context);
        foreach (var r in facts.AromaticRingsOf[carbon])
        {
            if (context.Rings.Rings[r].Length != 6 || !facts.RingHasOrthoDonors[r])
            {
                continue;
            }

            if (!HasDonor(context, carbon) && context.Molecule.Degree(carbon) == 2)
            {
                estimate.Add("ortho-dioxygenated ring", -3.0);
            }

            estimate.Widen(2.5);
            return;
        }
    }

    /// <summary>True when two neighbouring ring carbons carry O/N donors.</summary>
    public static bool HasAdjacentDonors(PredictionContext context, System.Collections.Immutable.ImmutableArray<int> ring)
    {
        for (var k = 0; k < ring.Length; k++)
        {
            if (HasDonor(context, ring[k]) && HasDonor(context, ring[(k + 1) % ring.Length]))
            {
                return true;
            }
        }

        return false;
    }

    private static bool HasDonor(PredictionContext context, int ringAtom)
    {
        var m = context.Molecule;
        if (!context.IsAromatic(ringAtom) || m.Atoms[ringAtom].AtomicNumber != Topology.Carbon)
        {
            return false;
        }

        foreach (var x in m.Neighbours(ringAtom))
        {
            if (!context.IsAromatic(x) && m.Atoms[x].AtomicNumber is Topology.Oxygen or Topology.Nitrogen
                && m.Bonds[m.BondBetween(ringAtom, x)].Order == 1)
            {
                return true;
            }
        }

        return false;
    }
}
