namespace ConsistencyHost.Chemistry.Perception.Stereo;

/// <summary>How an automorphism acts on the stereo elements of one configuration.</summary>
[Flags]
internal enum SymmetryKind
{
    /// <summary>Not a symmetry of the stereo-molecule.</summary>
    None = 0,
    /// <summary>Every parity kept: a proper operation (rotation-like).</summary>
    Rotation = 1,
    /// <summary>Every tetrahedral parity inverted, every double bond kept: an improper operation (reflection-like).</summary>
    Reflection = 2,
    /// <summary>No tetrahedral element at all: the automorphism is both.</summary>
    Both = Rotation | Reflection,
}

/// <summary>Classifies automorphisms by their action on stereo parities (nmr-methods.md §2.2, Algorithm A).</summary>
/// <remarks>At each centre the neighbour slots are carried through σ and compared with the slots stored at σ(c):
/// the parity seen through σ is the stored parity XOR the sign of that slot permutation. This is the parity
/// bookkeeping of Mislow &amp; Siegel's topicity criteria (J. Am. Chem. Soc. 106, 3319, 1984) done on graphs.</remarks>
internal sealed class StereoAction
{
    private readonly TetrahedralElement?[] tetraAt;
    private readonly Dictionary<(int, int), DoubleBondElement> doubleAt = [];
    private readonly IReadOnlyList<TetrahedralElement> tetra;
    private readonly IReadOnlyList<DoubleBondElement> doubles;

    public StereoAction(int atomCount, IReadOnlyList<TetrahedralElement> tetra, IReadOnlyList<DoubleBondElement> doubles)
    {
        this.tetra = tetra;
        this.doubles = doubles;
        tetraAt = new TetrahedralElement?[atomCount];
        foreach (var t in tetra)
        {
            tetraAt[t.Centre] = t;
        }

        foreach (var d in doubles)
        {
            doubleAt[(Math.Min(d.Begin, d.End), Math.Max(d.Begin, d.End))] = d;
        }
    }

    /// <summary>Number of atoms of the molecule.</summary>
    public int AtomCount => tetraAt.Length;

    /// <summary>True when at least one tetrahedral element exists (otherwise every automorphism is also reflection-like).</summary>
    public bool HasTetrahedral => tetra.Count > 0;

    /// <summary>Extra vertex colours so refinement keeps stereo atoms apart from others (never splits an orbit).</summary>
    public ulong[] Colours()
    {
        var colours = new ulong[tetraAt.Length];
        foreach (var t in tetra)
        {
            colours[t.Centre] |= 1;
        }

        foreach (var d in doubles)
        {
            colours[d.Begin] |= 2;
            colours[d.End] |= 2;
        }

        return colours;
    }

    public SymmetryKind Classify(int[] sigma)
    {
        foreach (var d in doubles)
        {
            if (!DoubleKept(d, sigma))
            {
                return SymmetryKind.None;
            }
        }

        if (tetra.Count == 0)
        {
            return SymmetryKind.Both;
        }

        var kept = 0;
        foreach (var t in tetra)
        {
            var image = tetraAt[sigma[t.Centre]];
            if (image is null)
            {
                return SymmetryKind.None;
            }

            kept += MappedParity(t, image, sigma) == image.Parity ? 1 : 0;
        }

        return kept == tetra.Count ? SymmetryKind.Rotation : kept == 0 ? SymmetryKind.Reflection : SymmetryKind.None;
    }

    /// <summary>Kinds still possible given the singleton cells of two partial partitions (the partial map
    /// sends the only vertex of cell c in <paramref name="a"/> to the only vertex of cell c in <paramref name="b"/>):
    /// elements whose atoms are all mapped already decide rotation or reflection.</summary>
    public SymmetryKind Feasible(int[] a, int[] b)
    {
        var map = PartialMap(a, b);
        var possible = SymmetryKind.Both;
        foreach (var d in doubles)
        {
            if (map[d.Begin] >= 0 && map[d.End] >= 0 && map[d.BeginReference] >= 0 && map[d.EndReference] >= 0 && !DoubleKept(d, map))
            {
                return SymmetryKind.None;
            }
        }

        foreach (var t in tetra)
        {
            if (map[t.Centre] < 0 || !Array.TrueForAll(t.Neighbours, n => n < 0 || map[n] >= 0))
            {
                continue;
            }

            var image = tetraAt[map[t.Centre]];
            if (image is null)
            {
                return SymmetryKind.None;
            }

            possible &= MappedParity(t, image, map) == image.Parity ? SymmetryKind.Rotation : SymmetryKind.Reflection;
            if (possible == SymmetryKind.None)
            {
                return possible;
            }
        }

        return possible;
    }

    private static int[] PartialMap(int[] a, int[] b)
    {
        var n = a.Length;
        var sizeA = new int[n];
        var onlyB = new int[n];
        Array.Fill(onlyB, -1);
        foreach (var c in a)
        {
            sizeA[c]++;
        }

        var sizeB = new int[n];
        for (var v = 0; v < n; v++)
        {
            sizeB[b[v]]++;
            onlyB[b[v]] = v;
        }

        var map = new int[n];
        for (var v = 0; v < n; v++)
        {
            map[v] = sizeA[a[v]] == 1 && sizeB[a[v]] == 1 ? onlyB[a[v]] : -1;
        }

        return map;
    }

    private static int MappedParity(TetrahedralElement t, TetrahedralElement image, int[] sigma)
    {
        Span<int> mapped = stackalloc int[4];
        for (var i = 0; i < 4; i++)
        {
            mapped[i] = t.Neighbours[i] < 0 ? -1 : sigma[t.Neighbours[i]];
        }

        return t.Parity ^ PermutationParity(mapped, image.Neighbours);
    }

    /// <summary>0 when <paramref name="a"/> is an even permutation of <paramref name="b"/>, 1 when odd.</summary>
    private static int PermutationParity(Span<int> a, int[] b)
    {
        Span<int> p = stackalloc int[4];
        for (var i = 0; i < 4; i++)
        {
            p[i] = Array.IndexOf(b, a[i]);
        }

        var inversions = 0;
        for (var i = 0; i < 4; i++)
        {
            for (var j = i + 1; j < 4; j++)
            {
                inversions += p[i] > p[j] ? 1 : 0;
            }
        }

        return inversions & 1;
    }

    private bool DoubleKept(DoubleBondElement d, int[] sigma)
    {
        var a = sigma[d.Begin];
        var b = sigma[d.End];
        if (!doubleAt.TryGetValue((Math.Min(a, b), Math.Max(a, b)), out var image))
        {
            return false;
        }

        var (refA, refB) = image.Begin == a ? (image.BeginReference, image.EndReference) : (image.EndReference, image.BeginReference);
        var flips = (sigma[d.BeginReference] == refA ? 0 : 1) + (sigma[d.EndReference] == refB ? 0 : 1);
        return (d.Parity ^ (flips & 1)) == image.Parity;
    }
}
