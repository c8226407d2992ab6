using System.Collections.Immutable;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>The aromatic ring an aromatic C–H sits in, and the questions asked about its atoms.</summary>
internal static class AromaticRing
{
    /// <summary>The smallest ring holding <paramref name="atom"/> whose atoms are all aromatic; empty when none.</summary>
    public static ImmutableArray<int> Of(PredictionContext context, int atom)
    {
        var best = ImmutableArray<int>.Empty;
        foreach (var ring in context.Rings.Rings)
        {
            if ((best.IsEmpty || ring.Length < best.Length) && ring.Contains(atom) && AllAromatic(context, ring))
            {
                best = ring;
            }
        }

        return best;
    }

    /// <summary>The neighbour of ring atom <paramref name="atom"/> that lies outside <paramref name="ring"/> across an
    /// aromatic bond (the next atom of a fused aromatic ring), or -1.</summary>
    public static int FusedPartner(PredictionContext context, ImmutableArray<int> ring, int atom)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (!ring.Contains(n) && context.IsAromaticBond(atom, n))
            {
                return n;
            }
        }

        return -1;
    }

    /// <summary>True for a ring carbon with an exocyclic double bond to O, S or N (pyridone-type carbon).</summary>
    public static bool HasExocyclicDoubleBond(PredictionContext context, ImmutableArray<int> ring, int atom)
    {
        var m = context.Molecule;
        var bonds = m.BondsOf(atom);
        var neighbours = m.Neighbours(atom);
        for (var k = 0; k < bonds.Length; k++)
        {
            if (m.Bonds[bonds[k]].Order == 2 && !ring.Contains(neighbours[k]) && !context.IsAromaticBond(atom, neighbours[k]))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>Ring positions apart along the ring (1 ortho, 2 meta, 3 para in a six-ring).</summary>
    public static int Distance(int ringLength, int i, int j)
    {
        var d = Math.Abs(i - j);
        return Math.Min(d, ringLength - d);
    }

    /// <summary>True when every ring atom is aromatic and no atom is a pyridone-type carbon (a benzenoid carbocycle).</summary>
    public static bool IsCarbocycle(PredictionContext context, ImmutableArray<int> ring)
    {
        foreach (var a in ring)
        {
            if (context.Molecule.Atoms[a].AtomicNumber != 6 || HasExocyclicDoubleBond(context, ring, a))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>True when some ring atom continues into a fused aromatic ring.</summary>
    public static bool IsFused(PredictionContext context, ImmutableArray<int> ring)
    {
        foreach (var a in ring)
        {
            if (FusedPartner(context, ring, a) >= 0)
            {
                return true;
            }
        }

        return false;
    }

    private static bool AllAromatic(PredictionContext context, ImmutableArray<int> ring)
    {
        foreach (var a in ring)
        {
            if (!context.IsAromatic(a))
            {
                return false;
            }
        }

        return true;
    }
}
