using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Stereo;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Stereo-aware heavy-atom orbits and hydrogen topicity for one full configuration.</summary>
/// <param name="Orbit">Per atom: smallest index of its orbit under the stereo-symmetry group.</param>
/// <param name="SplitHydrogens">Per atom: true when its two H are diastereotopic (two classes).</param>
internal sealed record ConfigurationSymmetry(int[] Orbit, bool[] SplitHydrogens)
{
    /// <summary>Does an automorphism of one of the kinds in the mask send from[i] to to[i] for every i?</summary>
    private delegate bool Exists(int[] from, int[] to, SymmetryKind mask);

    /// <param name="ctx">The molecule's symmetry context.</param>
    /// <param name="tetra">Tetrahedral elements with their parities for this configuration.</param>
    /// <param name="doubles">Double-bond elements with their parities.</param>
    /// <param name="splitNitrogens">NH2 groups whose two H are made diastereotopic (slow amide rotation).</param>
    /// <param name="startCells">The stereo-coloured start partition, when already known.</param>
    /// <param name="group">The listed automorphism group, when small enough to list: the questions are then
    /// answered by filtering the list (same answers as the search, without searching).</param>
    public static ConfigurationSymmetry Compute(
        SymmetryContext ctx, IReadOnlyList<TetrahedralElement> tetra, IReadOnlyList<DoubleBondElement> doubles, ISet<int>? splitNitrogens = null,
        int[]? startCells = null, AutomorphismGroup? group = null)
    {
        var action = new StereoAction(ctx.Molecule.AtomCount, tetra, doubles);
        var (orbit, exists) = group is null ? Searched(ctx, action, startCells) : Listed(group, action);
        var split = new bool[ctx.Molecule.AtomCount];
        for (var v = 0; v < split.Length; v++)
        {
            split[v] = orbit[v] == v && (splitNitrogens?.Contains(v) == true || IsSplit(ctx, action, exists, v));
        }

        for (var v = 0; v < split.Length; v++)
        {
            split[v] = split[orbit[v]];
        }

        return new ConfigurationSymmetry(orbit, split);
    }

    /// <summary>Orbits and existence questions answered by the individualisation–refinement search.</summary>
    private static (int[] Orbit, Exists Exists) Searched(SymmetryContext ctx, StereoAction action, int[]? startCells)
    {
        var cells = ctx.IsRigid ? ctx.Cells : startCells ?? StartCells(ctx, action);
        bool IsSymmetry(int[] s) => action.Classify(s) != SymmetryKind.None;
        bool MayBeSymmetry(int[] a, int[] b) => action.Feasible(a, b) != SymmetryKind.None;
        // With a discrete partition the identity is the only automorphism.
        var discrete = PartitionRefiner.CountCells(cells) == cells.Length;
        var orbit = discrete ? Identity(cells.Length) : OrbitFinder.Orbits(ctx.Search, cells, IsSymmetry, MayBeSymmetry);
        bool Exists(int[] from, int[] to, SymmetryKind mask) =>
            discrete ? IdentityQualifies(action, from, to, mask)
            : ctx.Search.Find(cells, from, to, s => (action.Classify(s) & mask) != 0, (x, y) => (action.Feasible(x, y) & mask) != 0) is not null;
        return (orbit, Exists);
    }

    /// <summary>Orbits and existence questions answered from the listed group, each automorphism classified once.</summary>
    private static (int[] Orbit, Exists Exists) Listed(AutomorphismGroup group, StereoAction action)
    {
        var kinds = new SymmetryKind[group.Elements.Count];
        for (var i = 0; i < kinds.Length; i++)
        {
            kinds[i] = action.Classify(group.Elements[i]);
        }

        var orbit = group.Orbits(i => kinds[i] != SymmetryKind.None);
        bool Exists(int[] from, int[] to, SymmetryKind mask) => group.IndexOf(from, to, i => (kinds[i] & mask) != 0) >= 0;
        return (orbit, Exists);
    }

    private static bool IdentityQualifies(StereoAction action, int[] from, int[] to, SymmetryKind mask) =>
        from.AsSpan().SequenceEqual(to) && (action.Classify(Identity(action.AtomCount)) & mask) != 0;

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
    private static bool IsSplit(SymmetryContext ctx, StereoAction action, Exists exists, int v)
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
            return !Sp3PairExchanged(action, exists, v, n[0], n[1]);
        }

        if (n.Length == 1 && m.BondOrderSum(v) == 2)
        {
            return !TerminalAlkenePairExchanged(ctx, exists, v, n[0]);
        }

        return false;
    }

    /// <summary>A CH2 with ligands a, b: its H are exchanged by a rotation swapping a and b, or by a reflection
    /// fixing both (the mirror plane through a, v, b).</summary>
    /// <remarks>Shortcut: with no tetrahedral element the identity is reflection-like.</remarks>
    private static bool Sp3PairExchanged(StereoAction action, Exists exists, int v, int a, int b) =>
        !action.HasTetrahedral || exists([v, a], [v, b], SymmetryKind.Rotation) || exists([v, a], [v, a], SymmetryKind.Reflection);

    /// <summary>=CH2 on w: its H are exchanged only when a symmetry fixing the C=C swaps w's two other ligands.</summary>
    private static bool TerminalAlkenePairExchanged(SymmetryContext ctx, Exists exists, int v, int w)
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
            _ => exists([v, w, others[0]], [v, w, others[1]], SymmetryKind.Both),
        };
    }
}
