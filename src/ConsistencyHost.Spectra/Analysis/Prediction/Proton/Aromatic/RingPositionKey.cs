using System.Collections.Immutable;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>
/// A number naming a ring position by what surrounds it: the ring size and the atoms met walking round the ring from
/// the position (c ring CH/C, k pyridone-type C=X, n pyridine-type N, p pyrrole-type N, o, s, N⁺, other), each
/// fusion atom also naming the size of the fused ring and the atom it continues into. The smaller of the two walking
/// directions is the key, so pyridine H-2 and H-6 share one key, and so do indole H-2 and a 2-substituted indole's.
/// Substituents are not part of the key: their increments are added afterwards.
/// </summary>
internal static class RingPositionKey
{
    private const int Bits = 6;

    /// <summary>The key of ring position <paramref name="index"/>; 0 when the ring holds an atom no table knows.</summary>
    public static ulong Of(PredictionContext context, ImmutableArray<int> ring, int index)
    {
        if (ring.Length > 8)
        {
            return 0;
        }

        ulong forward = (ulong)ring.Length, backward = (ulong)ring.Length;
        for (var step = 1; step < ring.Length; step++)
        {
            var f = Token(context, ring, ring[(index + step) % ring.Length]);
            var b = Token(context, ring, ring[(index - step + ring.Length) % ring.Length]);
            if (f == 0 || b == 0)
            {
                return 0;
            }

            forward = (forward << Bits) | f;
            backward = (backward << Bits) | b;
        }

        return Math.Min(forward, backward);
    }

    private static ulong Token(PredictionContext context, ImmutableArray<int> ring, int atom)
    {
        var partner = AromaticRing.FusedPartner(context, ring, atom);
        if (partner < 0)
        {
            return PlainToken(context, ring, atom);
        }

        var partnerRing = PartnerRing(context, ring, atom, partner);
        var partnerToken = AromaticRing.FusedPartner(context, partnerRing, partner) >= 0 ? 9UL : PlainToken(context, partnerRing, partner);
        var size = partnerRing.Length switch { 5 => 0UL, 6 => 1UL, _ => 2UL };
        return 16 + size * 10 + partnerToken;
    }

    private static ImmutableArray<int> PartnerRing(PredictionContext context, ImmutableArray<int> ring, int a, int b)
    {
        var best = ImmutableArray<int>.Empty;
        foreach (var r in context.Rings.Rings)
        {
            if (r != ring && (best.IsEmpty || r.Length < best.Length) && r.Contains(a) && r.Contains(b))
            {
                best = r;
            }
        }

        return best.IsEmpty ? ring : best;
    }

    private static ulong PlainToken(PredictionContext context, ImmutableArray<int> ring, int atom)
    {
        var a = context.Molecule.Atoms[atom];
        return a.AtomicNumber switch
        {
            6 => AromaticRing.HasExocyclicDoubleBond(context, ring, atom) ? 2UL : 1UL,
            7 when a.Charge != 0 => 7UL,
            7 => context.Molecule.Degree(atom) + a.HydrogenCount >= 3 ? 4UL : 3UL,
            8 => 5UL,
            16 or 34 => 6UL,
            _ => 8UL,
        };
    }
}
