using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Stereo;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Stereo-aware heavy-atom orbits and hydrogen topicity for one full configuration.</summary>
/// <param name="Orbit">Per atom: smallest index of its orbit under the stereo-symmetry group.</param>
/// <param name="SplitHydrogens">Per atom: true when its two H are diastereotopic (two classes).</param>
internal sealed record ConfigurationSymmetry(int[] Orbit, bool[] SplitHydrogens)
{
    public static ConfigurationSymmetry Compute(
        SymmetryContext ctx, IReadOnlyList<TetrahedralElement> tetra, IReadOnlyList<DoubleBondElement> doubles, ISet<int>? splitNitrogens = null,
        int[]? startCells = null)
    {
        var action = new StereoAction(ctx.Molecule.AtomCount, tetra, doubles);
        var cells = ctx.IsRigid ? ctx.Cells : startCells ?? StartCells(ctx, action);
        bool IsSymmetry(int[] s) => action.Classify(s) != SymmetryKind.None;
        bool MayBeSymmetry(int[] a, int[] b) => action.Feasible(a, b) != SymmetryKind.None;
        var discrete = PartitionRefiner.CountCells(cells) == cells.Length;
        var orbit = discrete ? Identity(cells.Length) : OrbitFinder.Orbits(ctx.Search, cells, IsSymmetry, MayBeSymmetry);
        var split = new bool[ctx.Molecule.AtomCount];
        for (var v = 0; v < split.Length; v++)
        {
            split[v] = orbit[v] == v && (splitNitrogens?.Contains(v) == true || IsSplit(ctx, action, cells, v));
        }

        for (var v = 0; v < split.Length; v++)
        {
            split[v] = split[orbit[v]];
        }

        return new ConfigurationSymmetry(orbit, split);
    }

    /// <summary>The equitable partition with stereo atoms coloured; it depends on which atoms carry elements,
    /// not on their parities, so one partition serves every configuration of a molecule.</summary>
    public static int[] StartCells(SymmetryContext ctx, IReadOnlyList<TetrahedralElement> tetra, IReadOnlyList<DoubleBondElement> doubles) =>
        StartCells(ctx, new StereoAction(ctx.Molecule.AtomCount, tetra, doubles));

    private static int[] StartCells(SymmetryContext ctx, StereoAction action) => ctx.Refiner.Initial(action.Colours());

    private static int[] Identity(int n)
    {
        var orbit = new int[n];
        for (var i = 0; i < n; i++)
        {
            orbit[i] = i;
        }

        return orbit;
    }

    /// <summary>Are the two H of <paramref name="v"/> diastereotopic? (see nmr-methods.md §2.2 and docs/chemistry.md)</summary>
    private static bool IsSplit(SymmetryContext ctx, StereoAction action, int[] cells, int v)
    {
        var m = ctx.Molecule;
        var atom = m.Atoms[v];
        if (atom.HydrogenCount != 2 || atom.AtomicNumber is not (6 or 14))
        {
            return false;
        }

        var n = m.Neighbours(v);
        if (n.Length == 2 && m.BondOrderSum(v) == 2)
        {
            return !Sp3PairExchanged(ctx, action, cells, v, n[0], n[1]);
        }

        if (n.Length == 1 && m.BondOrderSum(v) == 2)
        {
            return !TerminalAlkenePairExchanged(ctx, action, cells, v, n[0]);
        }

        return false;
    }

    /// <summary>A CH2 with ligands a, b: its H are exchanged by a rotation swapping a and b, or by a reflection
    /// fixing both (the mirror plane through a, v, b).</summary>
    /// <remarks>Shortcuts: with no tetrahedral element the identity is reflection-like; a and b in different
    /// cells cannot be swapped; with a discrete partition the identity is the only symmetry.</remarks>
    private static bool Sp3PairExchanged(SymmetryContext ctx, StereoAction action, int[] cells, int v, int a, int b)
    {
        if (!action.HasTetrahedral)
        {
            return true;
        }

        var discrete = PartitionRefiner.CountCells(cells) == cells.Length;
        if (!discrete && cells[a] == cells[b]
            && ctx.Search.Find(cells, [v, a], [v, b], s => (action.Classify(s) & SymmetryKind.Rotation) != 0,
                (x, y) => (action.Feasible(x, y) & SymmetryKind.Rotation) != 0) is not null)
        {
            return true;
        }

        return !discrete && ctx.Search.Find(cells, [v, a], [v, a], s => (action.Classify(s) & SymmetryKind.Reflection) != 0,
            (x, y) => (action.Feasible(x, y) & SymmetryKind.Reflection) != 0) is not null;
    }

    /// <summary>=CH2 on w: its H are exchanged only when a symmetry fixing the C=C swaps w's two other ligands.</summary>
    private static bool TerminalAlkenePairExchanged(SymmetryContext ctx, StereoAction action, int[] cells, int v, int w)
    {
        var m = ctx.Molecule;
        var others = new List<int>();
        foreach (var x in m.Neighbours(w))
        {
            if (x != v)
            {
                others.Add(x);
            }
        }

        if (others.Count == 1 && m.Bonds[m.BondBetween(w, others[0])].Order == 2)
        {
            return true; // allene terminus: the CH2 plane is perpendicular to the substituent plane
        }

        return others.Count switch
        {
            0 => true,
            1 => false, // a monosubstituted alkene: one H cis, one trans to the substituent
            _ => ctx.Search.Find(cells, [v, w, others[0]], [v, w, others[1]], s => action.Classify(s) != SymmetryKind.None,
                (x, y) => action.Feasible(x, y) != SymmetryKind.None) is not null,
        };
    }
}
