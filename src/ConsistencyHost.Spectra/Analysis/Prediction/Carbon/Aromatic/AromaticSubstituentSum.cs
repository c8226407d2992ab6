using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Adds the increments of every substituent on the rings holding one aromatic carbon, by ring distance (ipso,
/// ortho, meta, para), and widens the window with the size of each increment and with crowding.
/// </summary>
/// <remarks>
/// Additivity error grows with the increment and with ortho crowding (Pretsch et al. 2009 note deviations of several
/// ppm for ortho-disubstituted and push–pull benzenes; from memory): each applied increment adds 0.3 + 12 % of its
/// size to the half-width, plus 1 ppm for each substituted ortho neighbour of a substituted carbon.
/// </remarks>
internal static class AromaticSubstituentSum
{
    private const int MaxRingAtoms = 24;

    /// <summary>Adds the increments; returns how many substituents contributed.</summary>
    public static int Add(PredictionContext context, int carbon, CarbonEstimate estimate)
    {
        Span<int> atoms = stackalloc int[MaxRingAtoms];
        Span<int> distances = stackalloc int[MaxRingAtoms];
        Span<double> scales = stackalloc double[MaxRingAtoms];
        Span<bool> heteroPara = stackalloc bool[MaxRingAtoms];
        Span<bool> fiveRing = stackalloc bool[MaxRingAtoms];
        var n = CollectRingAtoms(context, carbon, atoms, distances, scales, heteroPara, fiveRing);
        var count = 0;
        var m = context.Molecule;
        for (var i = 0; i < n; i++)
        {
            var s = atoms[i];
            var neighbours = m.Neighbours(s);
            var bonds = m.BondsOf(s);
            for (var k = 0; k < neighbours.Length; k++)
            {
                var x = neighbours[k];
                if (m.Bonds[bonds[k]].Order != 1 || (context.IsAromatic(x) && context.IsAromaticBond(s, x)))
                {
                    continue;
                }

                if (m.Atoms[s].AtomicNumber != Topology.Carbon)
                {
                    continue; // substituents on ring nitrogen: see RingNitrogenSubstituents
                }

                count++;
                var row = RingSubstituents.Of(context, s, x);
                var d = distances[i] == 2 && heteroPara[i] ? 3 : distances[i];
                var five = fiveRing[i];
                var scale = scales[i] * (d == 0 ? IpsoScale(context, carbon, x) : d == 1 ? FusedRingBonds.OrthoScale(context, carbon, s) : 1.0);
                var spread = d == 0 ? row.Spread : row.Spread / 2;
                var value = row.At(d) * scale;
                if (five && d == 1 && IsAcceptor(context, s, x))
                {
                    // π-acceptors on five-membered heteroarenes deshield the next ring carbon strongly: thiophene-
                    // 2-carbaldehyde C-3 136.4, 2-acetylthiophene 132.4, furfural C-3 121.1 (from memory).
                    value = 6.0;
                    spread = 3.5;
                }

                estimate.Add(row.LabelAt(d), value);
                var proportional = five || (d == 1 && scale != 1.0) ? 0.25 : 0.12;
                estimate.Widen(0.3 + proportional * Math.Abs(value) + spread);
            }
        }

        estimate.Widen(RingCrowding.Of(context, carbon));
        OrthoDonors.Apply(context, carbon, estimate);
        BenzoFusedFiveRing.Apply(context, carbon, estimate);
        return count;
    }

    /// <summary>Ring atoms sharing a ring with <paramref name="carbon"/>, each once at its shortest ring distance.</summary>
    private static int CollectRingAtoms(PredictionContext context, int carbon, Span<int> atoms, Span<int> distances, Span<double> scales,
        Span<bool> heteroPara, Span<bool> fiveRing)
    {
        var n = 0;
        foreach (var r in AromaticFacts.Of(context).AromaticRingsOf[carbon])
        {
            var ring = context.Rings.Rings[r];
            var at = ring.IndexOf(carbon);

            var scale = RingScale(context, ring);
            for (var k = 0; k < ring.Length; k++)
            {
                var forward = (k - at + ring.Length) % ring.Length;
                var d = Math.Min(forward, ring.Length - forward);
                var existing = atoms[..n].IndexOf(ring[k]);
                if (existing >= 0)
                {
                    distances[existing] = Math.Min(distances[existing], d);
                    continue;
                }

                if (n == atoms.Length)
                {
                    break;
                }

                atoms[n] = ring[k];
                distances[n] = d;
                scales[n] = scale;
                heteroPara[n] = ring.Length == 5 && d == 2 && MiddleIsHetero(context, ring, at, forward);
                fiveRing[n] = ring.Length == 5;
                n++;
            }
        }

        return n;
    }

    private static bool IsAcceptor(PredictionContext context, int ringAtom, int x) =>
        GroupClassifier.Classify(context, ringAtom, x) is Group.Acyl or Group.Formyl or Group.Ester or Group.Amide
            or Group.CarboxylicAcid or Group.Nitrile or Group.Nitro;

    private static bool MiddleIsHetero(PredictionContext context, System.Collections.Immutable.ImmutableArray<int> ring, int at, int forward)
    {
        var middle = forward == 2 ? ring[(at + 1) % ring.Length] : ring[(at - 1 + ring.Length) % ring.Length];
        return context.Molecule.Atoms[middle].AtomicNumber != Topology.Carbon;
    }

    private static double RingScale(PredictionContext context, System.Collections.Immutable.ImmutableArray<int> ring)
    {
        if (ring.Length == 5)
        {
            return 1.0;
        }

        foreach (var a in ring)
        {
            if (context.Molecule.Atoms[a].AtomicNumber != Topology.Carbon)
            {
                return 0.9;
            }
        }

        return 1.0;
    }

    private static double IpsoScale(PredictionContext context, int carbon, int substituent)
    {
        var m = context.Molecule;
        if (m.Atoms[substituent].AtomicNumber == Topology.Carbon)
        {
            return 1.0;
        }

        foreach (var x in m.Neighbours(carbon))
        {
            if (context.IsAromatic(x) && context.IsAromaticBond(carbon, x) && m.Atoms[x].AtomicNumber != Topology.Carbon)
            {
                return 0.5;
            }
        }

        return 1.0;
    }
}
