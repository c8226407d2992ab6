namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>
/// Per-molecule ring facts the carbon tables ask for: each atom's smallest ring, how many rings hold it, and the
/// heteroatom of that smallest ring. Computed once per <see cref="PredictionContext"/> and kept beside it.
/// </summary>
internal sealed class RingFacts
{
    private RingFacts(int[] smallest, int[] count, int[] hetero, int[] smallestRing)
    {
        SmallestSize = smallest;
        RingCount = count;
        SmallestRingHetero = hetero;
        SmallestRingIndex = smallestRing;
    }

    /// <summary>Size of the smallest ring holding the atom (0 when acyclic).</summary>
    public int[] SmallestSize { get; }

    /// <summary>How many rings of the smallest set hold the atom.</summary>
    public int[] RingCount { get; }

    /// <summary>The first heteroatom element of the atom's smallest ring (0 for a carbocycle or no ring).</summary>
    public int[] SmallestRingHetero { get; }

    /// <summary>Index of the atom's smallest ring in <see cref="PredictionContext.Rings"/> (−1 when acyclic).</summary>
    public int[] SmallestRingIndex { get; }

    /// <summary>The facts of <paramref name="context"/>'s molecule, computed once and kept by the context.</summary>
    public static RingFacts Of(PredictionContext context) => context.Facts(ref context.RingFactsSlot, Compute);

    private static RingFacts Compute(PredictionContext context)
    {
        var n = context.Molecule.AtomCount;
        var smallest = new int[n];
        var count = new int[n];
        var hetero = new int[n];
        var index = new int[n];
        Array.Fill(index, -1);
        var rings = context.Rings.Rings;
        for (var r = 0; r < rings.Length; r++)
        {
            var ring = rings[r];
            var element = HeteroElement(context, ring);
            foreach (var a in ring)
            {
                count[a]++;
                if (smallest[a] == 0 || ring.Length < smallest[a])
                {
                    smallest[a] = ring.Length;
                    hetero[a] = element;
                    index[a] = r;
                }
            }
        }

        return new RingFacts(smallest, count, hetero, index);
    }

    private static int HeteroElement(PredictionContext context, System.Collections.Immutable.ImmutableArray<int> ring)
    {
        foreach (var a in ring)
        {
            var z = context.Molecule.Atoms[a].AtomicNumber;
            if (z != Topology.Carbon)
            {
                return z;
            }
        }

        return 0;
    }
}
