using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;

namespace ConsistencyHost.Chemistry.Perception.Stereo;

/// <summary>Finds atoms and double bonds that can carry configuration, specified or not.</summary>
/// <remarks>
/// A tetrahedral candidate is an sp3 C, Si, N+ or P with four ligands (at most one H) whose ligands are pairwise
/// different when seen from the centre (cells after individualising the centre). A centre with one pair of
/// equal ligands is still a candidate when (a) it lies in a ring together with another such centre or a true
/// candidate (1,4-disubstituted cyclohexanes: ring cis/trans), or (b) the equal branches contain true
/// candidates (pseudo-asymmetric centres, e.g. C3 of 2,3,4-trihydroxyglutaric acid). A double-bond candidate is
/// an acyclic non-aromatic C=C, C=N or N=N whose ends each carry two different ligands (H or lone pair counts).
/// Input descriptors on atoms or bonds that are not candidates carry no configuration and are ignored. Every
/// other sp3 centre with at most one H, and every other acyclic double bond with a heavy ligand at each end, gets
/// an arbitrary fixed parity, as Algorithm A requires (nmr-methods.md §2.2): that is what makes the CH2 protons
/// of glycerol or citric acid diastereotopic and the methyls of 2-methylbut-2-ene different.
/// </remarks>
internal static class StereoCandidates
{
    public static (List<TetrahedralElement> Tetrahedral, List<DoubleBondElement> DoubleBonds) Find(SymmetryContext ctx)
    {
        var m = ctx.Molecule;
        var status = new int[m.AtomCount]; // 0 none, 1 candidate, 2 pending ring, 3 pending pseudo
        var pairs = new (int A, int B)[m.AtomCount];
        for (var c = 0; c < m.AtomCount; c++)
        {
            (status[c], pairs[c]) = Classify(ctx, c);
        }

        Resolve(ctx, status, pairs);
        var specifiedTetra = m.TetrahedralStereo.ToDictionary(t => t.Centre);
        var tetra = new List<TetrahedralElement>();
        for (var c = 0; c < m.AtomCount; c++)
        {
            if (status[c] == 1)
            {
                var fixedByRings = RingJunctions.IsBridgedBridgehead(ctx, c);
                tetra.Add(specifiedTetra.TryGetValue(c, out var t)
                    ? new TetrahedralElement(c, [.. t.Neighbours], t.Winding == TetrahedralWinding.Clockwise ? 1 : 0, true)
                    : new TetrahedralElement(c, Slots(m, c), 0, false, FixedByRings: fixedByRings));
            }
            else if (status[c] == 0 && pairs[c].A == -2)
            {
                tetra.Add(new TetrahedralElement(c, Slots(m, c), 0, true, Stereogenic: false));
            }
        }

        return (tetra, DoubleBondCandidates.Find(ctx));
    }

    private static bool AllDistinct(int[] cells, ReadOnlySpan<int> atoms)
    {
        for (var i = 0; i < atoms.Length; i++)
        {
            for (var j = i + 1; j < atoms.Length; j++)
            {
                if (cells[atoms[i]] == cells[atoms[j]])
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>Four-ligand centres that keep their configuration on the NMR time scale: sp3 C and Si, quaternary
    /// N+, four-coordinate P (phosphates, phosphonates, phosphoramides, phosphonium), three-coordinate S with a lone
    /// pair (sulfoxides, sulfinamides, sulfonium) and four-coordinate S (sulfones, sulfonamides). Neutral amines
    /// invert quickly and are not centres, except a bridgehead N of a bridged ring system (quinuclidine, hexamine,
    /// Tröger's base), whose inversion the bridges forbid.</summary>
    private static bool IsTetrahedralKind(SymmetryContext ctx, int c)
    {
        var m = ctx.Molecule;
        var a = m.Atoms[c];
        var degree = m.Degree(c);
        var sum = m.BondOrderSum(c);
        return a.AtomicNumber switch
        {
            6 or 14 => a.Charge == 0 && degree + a.HydrogenCount == 4 && sum == degree,
            7 => (a.Charge == 1 && degree == 4 && sum == 4)
                || (a.Charge == 0 && degree == 3 && sum == 3 && a.HydrogenCount == 0 && !ctx.Aromaticity.AromaticAtoms[c] && RingJunctions.IsBridgedBridgehead(ctx, c)),
            15 => a.Charge is 0 or 1 && degree + a.HydrogenCount == 4,
            16 => a.HydrogenCount == 0 && ((degree == 3 && ((a.Charge == 0 && sum == 4) || (a.Charge == 1 && sum == 3))) || (degree == 4 && a.Charge == 0 && sum == 6)),
            _ => false,
        };
    }

    private static int[] Slots(Molecule m, int c)
    {
        var n = m.Neighbours(c);
        return n.Length == 4 ? [n[0], n[1], n[2], n[3]] : [n[0], n[1], n[2], TetrahedralStereo.ImplicitHydrogen];
    }

    private static (int Status, (int, int) Pair) Classify(SymmetryContext ctx, int c)
    {
        var m = ctx.Molecule;
        var a = m.Atoms[c];
        var degree = m.Degree(c);
        if (!IsTetrahedralKind(ctx, c) || a.HydrogenCount > 1 || IsCageAtom(ctx, c))
        {
            return (0, (-1, -1));
        }

        var n = m.Neighbours(c);
        // Refinement only splits cells, so ligands already apart in the equitable partition stay apart.
        var cells = AllDistinct(ctx.Cells, n) ? ctx.Cells : ctx.Refiner.Individualise(ctx.Cells, c);
        var equal = new List<(int, int)>();
        for (var i = 0; i < n.Length; i++)
        {
            for (var j = i + 1; j < n.Length; j++)
            {
                if (cells[n[i]] == cells[n[j]])
                {
                    equal.Add((n[i], n[j]));
                }
            }
        }

        return equal.Count switch
        {
            0 => (1, (-1, -1)),
            1 when ctx.Rings.AtomInRing[c] && ctx.Rings.AtomInRing[equal[0].Item1] && ctx.Rings.AtomInRing[equal[0].Item2] => (2, equal[0]),
            1 => (3, equal[0]),
            _ when RingBonds(ctx, c) == 0 => (0, (-2, -2)),
            _ => (0, (-1, -1)),
        };
    }

    private static void Resolve(SymmetryContext ctx, int[] status, (int A, int B)[] pairs)
    {
        var m = ctx.Molecule;
        var final = (int[])status.Clone();
        for (var c = 0; c < m.AtomCount; c++)
        {
            final[c] = status[c] switch
            {
                1 => 1,
                2 => SharesRingWithCandidate(ctx, status, c) ? 1 : Demote(ctx, pairs, c),
                3 => BranchHasCandidate(m, status, c, pairs[c].A) ? 1 : Demote(ctx, pairs, c),
                _ => 0,
            };
        }

        Array.Copy(final, status, status.Length);
    }

    /// <summary>An sp3 centre that is not stereogenic still gets an arbitrary parity (marked by pair -2) when its
    /// mirror image is reachable by a local flip: acyclic centres, ring atoms in a single ring, and spiro atoms (each
    /// ring keeps its own faces, so the centre is prochiral like an acyclic one).</summary>
    private static int Demote(SymmetryContext ctx, (int A, int B)[] pairs, int c)
    {
        if (RingBonds(ctx, c) <= 2 || RingJunctions.IsSpiro(ctx, c))
        {
            pairs[c] = (-2, -2);
        }

        return 0;
    }

    private static int RingBonds(SymmetryContext ctx, int atom) => RingJunctions.RingBonds(ctx, atom);

    /// <summary>A bridgehead whose ring neighbours are all bridgeheads too (cuneane, cubane, fullerene-like cages):
    /// its configuration is fixed by the cage, so it is neither enumerated nor given an arbitrary parity. A
    /// ring-fusion or spiro atom with an ordinary ring neighbour is not a cage atom: it can be a true stereocentre.</summary>
    private static bool IsCageAtom(SymmetryContext ctx, int atom)
    {
        if (RingBonds(ctx, atom) < 3)
        {
            return false;
        }

        var m = ctx.Molecule;
        foreach (var b in m.BondsOf(atom))
        {
            if (ctx.Rings.BondInRing[b] && RingBonds(ctx, m.Bonds[b].Other(atom)) < 3)
            {
                return false;
            }
        }

        return true;
    }

    private static bool SharesRingWithCandidate(SymmetryContext ctx, int[] status, int c)
    {
        foreach (var ring in ctx.Rings.Rings)
        {
            if (!ring.Contains(c))
            {
                continue;
            }

            foreach (var x in ring)
            {
                if (x != c && status[x] is 1 or 2)
                {
                    return true;
                }
            }
        }

        return false;
    }

    private static bool BranchHasCandidate(Molecule m, int[] status, int centre, int start)
    {
        var seen = new bool[m.AtomCount];
        seen[centre] = true;
        seen[start] = true;
        var stack = new Stack<int>();
        stack.Push(start);
        while (stack.Count > 0)
        {
            var v = stack.Pop();
            if (status[v] == 1)
            {
                return true;
            }

            foreach (var w in m.Neighbours(v))
            {
                if (!seen[w])
                {
                    seen[w] = true;
                    stack.Push(w);
                }
            }
        }

        return false;
    }
}
