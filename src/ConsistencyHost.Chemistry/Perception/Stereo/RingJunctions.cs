using ConsistencyHost.Chemistry.Perception.Symmetry;

namespace ConsistencyHost.Chemistry.Perception.Stereo;

/// <summary>Classifies ring junction atoms: bridgeheads of bridged ring systems (configuration fixed by the
/// rings) and spiro atoms (two ring systems meeting at one atom).</summary>
/// <remarks>
/// A bridged bridgehead (norbornane C1, adamantane CH, quinuclidine N, Tröger's base N) is joined to another,
/// non-adjacent atom by three ring paths sharing no atom: its three bridges all return to that partner, so the
/// atom cannot invert on its own. A fused junction (decalin, indolizidine N) reaches its partner by a direct
/// bond, so it is not bridged: its configuration is free (cis/trans decalin) and an amine N there inverts.
/// Found by three augmenting paths of a unit-capacity vertex flow over ring bonds (Menger's theorem).
/// </remarks>
internal static class RingJunctions
{
    public static int RingBonds(SymmetryContext ctx, int atom)
    {
        var n = 0;
        foreach (var b in ctx.Molecule.BondsOf(atom))
        {
            n += ctx.Rings.BondInRing[b] ? 1 : 0;
        }

        return n;
    }

    /// <summary>True when the atom is a spiro junction: its ring neighbours fall apart into separate ring systems
    /// once the atom is removed, so each ring keeps its own face and the centre cannot be flipped by a ring flip.</summary>
    public static bool IsSpiro(SymmetryContext ctx, int atom)
    {
        if (RingBonds(ctx, atom) < 4)
        {
            return false;
        }

        var reached = RingReach(ctx, atom, FirstRingNeighbour(ctx, atom));
        foreach (var b in ctx.Molecule.BondsOf(atom))
        {
            if (ctx.Rings.BondInRing[b] && !reached[ctx.Molecule.Bonds[b].Other(atom)])
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>True when the atom is a bridgehead of a bridged ring system (see the type remarks).</summary>
    public static bool IsBridgedBridgehead(SymmetryContext ctx, int atom)
    {
        if (RingBonds(ctx, atom) < 3)
        {
            return false;
        }

        var m = ctx.Molecule;
        for (var d = 0; d < m.AtomCount; d++)
        {
            if (d != atom && m.BondBetween(atom, d) < 0 && RingBonds(ctx, d) >= 3 && DisjointPaths(ctx, atom, d) >= 3)
            {
                return true;
            }
        }

        return false;
    }

    private static int FirstRingNeighbour(SymmetryContext ctx, int atom)
    {
        foreach (var b in ctx.Molecule.BondsOf(atom))
        {
            if (ctx.Rings.BondInRing[b])
            {
                return ctx.Molecule.Bonds[b].Other(atom);
            }
        }

        return -1;
    }

    private static bool[] RingReach(SymmetryContext ctx, int removed, int start)
    {
        var m = ctx.Molecule;
        var seen = new bool[m.AtomCount];
        seen[removed] = true;
        seen[start] = true;
        var stack = new Stack<int>();
        stack.Push(start);
        while (stack.Count > 0)
        {
            var v = stack.Pop();
            foreach (var b in m.BondsOf(v))
            {
                var w = m.Bonds[b].Other(v);
                if (ctx.Rings.BondInRing[b] && !seen[w])
                {
                    seen[w] = true;
                    stack.Push(w);
                }
            }
        }

        return seen;
    }

    /// <summary>Number of internally vertex-disjoint ring paths from s to t, stopping at three. Each atom v is split
    /// into v_in (2v) and v_out (2v+1) joined by a unit arc; each ring bond gives unit arcs both ways.</summary>
    private static int DisjointPaths(SymmetryContext ctx, int s, int t)
    {
        var m = ctx.Molecule;
        var flow = new Dictionary<(int, int), int>();
        int Residual(int u, int v, int capacity) => capacity - flow.GetValueOrDefault((u, v)) + flow.GetValueOrDefault((v, u));
        var paths = 0;
        while (paths < 3)
        {
            var parent = new Dictionary<int, int> { [2 * s + 1] = -1 };
            var queue = new Queue<int>();
            queue.Enqueue(2 * s + 1);
            var target = 2 * t;
            while (queue.Count > 0 && !parent.ContainsKey(target))
            {
                var u = queue.Dequeue();
                foreach (var (v, cap) in Arcs(u))
                {
                    if (!parent.ContainsKey(v) && Residual(u, v, cap) > 0)
                    {
                        parent[v] = u;
                        queue.Enqueue(v);
                    }
                }
            }

            if (!parent.ContainsKey(target))
            {
                break;
            }

            for (var v = target; parent[v] >= 0; v = parent[v])
            {
                var u = parent[v];
                flow[(u, v)] = flow.GetValueOrDefault((u, v)) + 1;
            }

            paths++;
        }

        return paths;

        List<(int, int)> Arcs(int node)
        {
            var arcs = new List<(int, int)>();
            var v = node / 2;
            if (node % 2 == 0)
            {
                arcs.Add((node + 1, 1)); // v_in -> v_out
                foreach (var b in m.BondsOf(v))
                {
                    if (ctx.Rings.BondInRing[b])
                    {
                        arcs.Add((2 * m.Bonds[b].Other(v) + 1, 0)); // reverse of w_out -> v_in
                    }
                }
            }
            else
            {
                arcs.Add((node - 1, 0)); // reverse of v_in -> v_out
                foreach (var b in m.BondsOf(v))
                {
                    if (ctx.Rings.BondInRing[b])
                    {
                        arcs.Add((2 * m.Bonds[b].Other(v), 1));
                    }
                }
            }

            return arcs;
        }
    }
}
