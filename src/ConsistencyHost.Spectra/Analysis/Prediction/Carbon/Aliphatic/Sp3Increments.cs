using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>
/// The Grant–Paul type sum for one sp3 carbon: base −2.3, the alkyl skeleton out to δ, every functional group met
/// on the way at its position, steric corrections, and a ring correction.
/// </summary>
/// <remarks>
/// The walk runs breadth-first over sp3 carbons only; every other atom met is a group and ends its branch (the
/// table's increment covers the group's own atoms). Each atom counts once, at its shortest distance, so a ring
/// closing back does not count twice. Error and its growth with substitution: Pretsch et al. (2009) quote about
/// ±2–3 ppm for monofunctional compounds and more for crowded or polyfunctional carbons (from memory); the
/// half-width below follows that, and its terms are calibrated on published data (see the tests).
/// </remarks>
internal static class Sp3Increments
{
    private const int MaxVisited = 96;

    /// <summary>The increment estimate for sp3 carbon <paramref name="carbon"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon)
    {
        var estimate = new CarbonEstimate().Base("base", -2.3);
        var tally = Walk(context, carbon, estimate);
        AddSteric(context, carbon, estimate);
        Sp3Corrections.Add(context, carbon, estimate);
        var rings = RingFacts.Of(context);
        var size = rings.SmallestSize[carbon];
        if (size == 5 && BondedToAreneInRing(context, carbon, rings.SmallestRingIndex[carbon]))
        {
            estimate.Add(RingCorrections.FusedFiveRingBenzylicLabel, RingCorrections.FusedFiveRingBenzylic);
        }
        else
        {
            estimate.AddNonZero(RingCorrections.Label(size), RingCorrections.Of(size, rings.SmallestRingHetero[carbon]));
        }

        HalfWidth(context, carbon, estimate, tally, rings);
        return estimate.Build(ShiftBasis.Increments, "substituents (increment error)", context.Molecule.Degree(carbon));
    }

    /// <summary>True when a neighbour of <paramref name="carbon"/> in ring <paramref name="ring"/> is aromatic.</summary>
    private static bool BondedToAreneInRing(PredictionContext context, int carbon, int ring)
    {
        if (ring < 0)
        {
            return false;
        }

        var atoms = context.Rings.Rings[ring];
        foreach (var x in context.Molecule.Neighbours(carbon))
        {
            if (context.IsAromatic(x) && atoms.Contains(x))
            {
                return true;
            }
        }

        return false;
    }

    private static Tally Walk(PredictionContext context, int carbon, CarbonEstimate estimate)
    {
        var m = context.Molecule;
        Span<int> seen = stackalloc int[MaxVisited];
        Span<int> queue = stackalloc int[MaxVisited];
        Span<byte> depth = stackalloc byte[MaxVisited];
        var nSeen = 1;
        seen[0] = carbon;
        int head = 0, tail = 0;
        queue[tail] = carbon;
        depth[tail++] = 0;
        var tally = default(Tally);
        while (head < tail)
        {
            var atom = queue[head];
            var position = depth[head++] + 1;
            foreach (var next in m.Neighbours(atom))
            {
                if (seen[..nSeen].Contains(next) || nSeen == MaxVisited)
                {
                    continue;
                }

                seen[nSeen++] = next;
                if (IsSkeleton(context, next))
                {
                    estimate.Add(AlkaneIncrements.AlkylLabels[position], AlkaneIncrements.Alkyl[position]);
                    if (position < 4)
                    {
                        queue[tail] = next;
                        depth[tail++] = (byte)position;
                    }

                    continue;
                }

                var group = GroupClassifier.Classify(context, atom, next);
                estimate.AddNonZero(AlkaneIncrements.Label(group, position), AlkaneIncrements.Value(group, position));
                tally.Add(group, position);
                if (position == 1 && group == Group.Aryl && Aromatic.AromaticFacts.Of(context).IsFiveRingHeteroaryl(next))
                {
                    // Five-membered heteroaryls shield their α carbon: 2-ethylthiophene CH2 23.5, 2-ethylfuran 21.4,
                    // 3-methylindole CH3 9.7 against ethylbenzene 28.9 and toluene 21.3 (from memory).
                    estimate.Add("α-5-ring heteroaryl", -6.5);
                    estimate.Widen(2.5);
                }
            }
        }

        return tally;
    }

    private static bool IsSkeleton(PredictionContext context, int atom) =>
        Topology.IsSp3Carbon(context, atom) && Topology.CountNeighbours(context.Molecule, atom, 9) < 3;

    private static void AddSteric(PredictionContext context, int carbon, CarbonEstimate estimate)
    {
        var m = context.Molecule;
        var degree = m.Degree(carbon);
        foreach (var next in m.Neighbours(carbon))
        {
            if (IsSkeleton(context, next))
            {
                estimate.AddNonZero("steric", StericCorrections.Of(degree, m.Degree(next)));
            }
        }
    }

    private static void HalfWidth(PredictionContext context, int carbon, CarbonEstimate estimate, Tally tally, RingFacts rings)
    {
        estimate.Widen(2.0 + 0.5 * context.Molecule.Degree(carbon) + tally.Spread);
        if (rings.SmallestSize[carbon] > 0)
        {
            var heteroFiveRing = rings.SmallestSize[carbon] == 5 && rings.SmallestRingHetero[carbon] != 0;
            estimate.Widen(rings.RingCount[carbon] > 1 ? 2.5 : heteroFiveRing ? 2.5 : 1.5);
        }

        if (context.Molecule.Degree(carbon) >= 3 && tally.AlphaGroups > 0)
        {
            // Branched carbons bearing a functional group: the n/iso difference of the tables (Silverstein).
            estimate.Widen(1.5);
        }
    }

    /// <summary>What the walk met, for the window.</summary>
    private struct Tally
    {
        public int AlphaGroups;
        public double Spread;

        public void Add(Group group, int position)
        {
            if (position == 1)
            {
                AlphaGroups++;
                Spread += AlkaneIncrements.Spread(group);
            }
            else if (position == 2)
            {
                Spread += AlkaneIncrements.Spread(group) / 2;
            }
            else if (position == 3)
            {
                // γ effects depend on conformation (gauche or anti).
                Spread += 0.5;
            }
        }
    }
}
