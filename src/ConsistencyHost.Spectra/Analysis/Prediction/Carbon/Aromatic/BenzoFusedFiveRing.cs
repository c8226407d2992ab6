using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// A saturated (or partly saturated) five-membered ring fused to a benzene ring bends the ring bonds at the fusion,
/// and the benzene increments, measured on open-chain substituents, miss two effects of that strain: the CH next to
/// a fusion carbon lies lower than the sum, and the fusion carbon across from a ring carbonyl lies much higher.
/// </summary>
/// <remarks>
/// From memory (Pretsch et al. 2009 and SDBS spectra), observed against this model's open-chain sum:
/// ortho to the fusion — indane C-4 124.4 (sum 128.0), 2,3-dihydrobenzofuran C-4 125.0 (129.0) and C-7 109.4
/// (114.1), indoline C-4 124.6 (128.7) and C-7 109.4 (112.4), 1,3-benzodioxole C-4 108.6 (112.1 after the
/// ortho-donor correction), 1-indanone C-7 123.7 (128.3), phthalide C-4 122.1 (128.2) and C-7 125.7 (129.7): −0.5 to
/// −6.1, mean about −3.5. Fusion carbon across from a ring C=O — 1-indanone C-3a 155.1 (sum 143.9), phthalide C-3a
/// 146.5 (137.1): about +9 to +11. Six-membered benzo-fused rings (tetralin, chromane, tetrahydroisoquinoline) fit
/// the plain sum and are not corrected.
/// </remarks>
internal static class BenzoFusedFiveRing
{
    private const double OrthoShift = -3.5;
    private const double OrthoSpread = 1.5;
    private const double AcrossCarbonylShift = 9.0;
    private const double AcrossCarbonylSpread = 3.0;

    /// <summary>Applies the corrections to aromatic carbon <paramref name="carbon"/> of a six-membered ring.</summary>
    public static void Apply(PredictionContext context, int carbon, CarbonEstimate estimate)
    {
        if (AromaticFacts.Of(context).RingSize[carbon] != 6)
        {
            return;
        }

        var m = context.Molecule;
        foreach (var ring in context.Rings.Rings)
        {
            if (ring.Length != 5 || !Fusion(context, ring, out var a, out var b))
            {
                continue;
            }

            var at = ring.IndexOf(carbon);
            if (at < 0)
            {
                if (m.BondBetween(carbon, ring[a]) >= 0 || m.BondBetween(carbon, ring[b]) >= 0)
                {
                    estimate.Add("ortho to a fused 5-ring", OrthoShift);
                    estimate.Widen(OrthoSpread);
                }

                continue;
            }

            // The fusion carbon whose other ring neighbour is saturated, across from a fusion carbon bearing the C=O.
            var other = at == a ? b : a;
            if (IsRingCarbonyl(context, ring, other, at) && !IsRingCarbonyl(context, ring, at, other) && !context.IsAromatic(RingNeighbour(ring, at, other)))
            {
                estimate.Add("fused 5-ring, C=O across the fusion", AcrossCarbonylShift);
                estimate.Widen(AcrossCarbonylSpread);
            }
        }
    }

    /// <summary>True when exactly two neighbouring atoms of the ring are aromatic (the fusion bond) and the rest are not.</summary>
    private static bool Fusion(PredictionContext context, System.Collections.Immutable.ImmutableArray<int> ring, out int a, out int b)
    {
        a = -1;
        b = -1;
        for (var k = 0; k < ring.Length; k++)
        {
            if (!context.IsAromatic(ring[k]))
            {
                continue;
            }

            if (a < 0)
            {
                a = k;
            }
            else if (b < 0)
            {
                b = k;
            }
            else
            {
                return false;
            }
        }

        return b >= 0 && (b - a == 1 || (a == 0 && b == ring.Length - 1)) && context.IsAromaticBond(ring[a], ring[b]);
    }

    /// <summary>True when the ring neighbour of position <paramref name="at"/> other than <paramref name="fusionPartner"/> is a carbonyl carbon.</summary>
    private static bool IsRingCarbonyl(PredictionContext context, System.Collections.Immutable.ImmutableArray<int> ring, int at, int fusionPartner) =>
        Topology.IsCarbonylCarbon(context.Molecule, RingNeighbour(ring, at, fusionPartner));

    private static int RingNeighbour(System.Collections.Immutable.ImmutableArray<int> ring, int at, int not)
    {
        var next = (at + 1) % ring.Length;
        return next == not ? ring[(at - 1 + ring.Length) % ring.Length] : ring[next];
    }
}
