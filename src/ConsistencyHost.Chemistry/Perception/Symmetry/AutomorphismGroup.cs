namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Every automorphism of the coloured heavy-atom graph, listed explicitly when the group is small.</summary>
/// <remarks>
/// A stabiliser chain (Sims, "Computational methods in the study of permutation groups", 1970) built with the
/// individualisation–refinement search of McKay (1981): base point b(i) is the first vertex of the first
/// non-singleton cell after b(1)…b(i−1) are individualised, and the search finds, for every vertex y of that
/// cell, an automorphism fixing b(1)…b(i−1) and sending b(i) to y when one exists (a transversal T(i)). Every
/// automorphism is then exactly one product t(1)∘…∘t(k) with t(i) in T(i), so the list is complete and
/// |G| = Π|T(i)|. Once the group is listed, the per-configuration questions of Algorithm A (which automorphisms
/// keep or invert the parities, which swap the two H of a CH2) are filters over the list instead of searches,
/// and give the same answers. Groups larger than <see cref="MaxOrder"/> (long perfluoroalkyl chains, many
/// tert-butyl groups) are not listed; the caller then searches as before.
/// </remarks>
internal sealed class AutomorphismGroup
{
    /// <summary>Largest group listed; 64 configurations × 256 automorphisms × one parity check each stays well
    /// under a millisecond, while larger groups grow multiplicatively with every CF3 or CMe3 group.</summary>
    public const int MaxOrder = 256;

    private AutomorphismGroup(List<int[]> elements) => Elements = elements;

    /// <summary>All automorphisms, the identity included.</summary>
    public IReadOnlyList<int[]> Elements { get; }

    /// <summary>Lists the group, or returns null when it has more than <see cref="MaxOrder"/> elements or a
    /// search ran out of budget (then the list could be incomplete).</summary>
    public static AutomorphismGroup? TryList(SymmetryContext ctx)
    {
        // An own search object, so that giving up here never marks the molecule's results as inexact.
        var search = new AutomorphismSearch(ctx.Graph, ctx.Refiner);
        var transversals = new List<List<int[]>>();
        var cells = ctx.Cells;
        var order = 1;
        for (var x = FirstInLargerCell(cells); x >= 0; x = FirstInLargerCell(cells))
        {
            var transversal = new List<int[]>();
            for (var y = 0; y < cells.Length; y++)
            {
                if (cells[y] == cells[x] && search.Find(cells, [x], [y]) is { } sigma)
                {
                    transversal.Add(sigma);
                }
            }

            order *= transversal.Count;
            if (search.BudgetExceeded || order > MaxOrder)
            {
                return null;
            }

            transversals.Add(transversal);
            cells = ctx.Refiner.Individualise(cells, x);
        }

        return new AutomorphismGroup(Products(transversals, cells.Length));
    }

    /// <summary>Orbits (smallest member per atom) of the automorphisms selected by <paramref name="keep"/>.</summary>
    public int[] Orbits(Func<int, bool> keep)
    {
        var orbit = Identity(Elements.Count == 0 ? 0 : Elements[0].Length);
        for (var i = 0; i < Elements.Count; i++)
        {
            if (keep(i))
            {
                UniteCycles(orbit, Elements[i]);
            }
        }

        for (var v = 0; v < orbit.Length; v++)
        {
            orbit[v] = Root(orbit, v);
        }

        return orbit;
    }

    /// <summary>Index of the first automorphism selected by <paramref name="keep"/> that sends each
    /// <paramref name="from"/>[j] to <paramref name="to"/>[j]; -1 when none does.</summary>
    public int IndexOf(ReadOnlySpan<int> from, ReadOnlySpan<int> to, Func<int, bool> keep)
    {
        for (var i = 0; i < Elements.Count; i++)
        {
            if (Maps(Elements[i], from, to) && keep(i))
            {
                return i;
            }
        }

        return -1;
    }

    private static bool Maps(int[] sigma, ReadOnlySpan<int> from, ReadOnlySpan<int> to)
    {
        for (var j = 0; j < from.Length; j++)
        {
            if (sigma[from[j]] != to[j])
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>G(i−1) = T(i)·G(i), starting from the trivial stabiliser of the whole base.</summary>
    private static List<int[]> Products(List<List<int[]>> transversals, int n)
    {
        var elements = new List<int[]> { Identity(n) };
        for (var i = transversals.Count - 1; i >= 0; i--)
        {
            var next = new List<int[]>(elements.Count * transversals[i].Count);
            foreach (var t in transversals[i])
            {
                foreach (var g in elements)
                {
                    var product = new int[n];
                    for (var v = 0; v < n; v++)
                    {
                        product[v] = t[g[v]];
                    }

                    next.Add(product);
                }
            }

            elements = next;
        }

        return elements;
    }

    private static int FirstInLargerCell(int[] cells)
    {
        var size = new int[cells.Length];
        foreach (var c in cells)
        {
            size[c]++;
        }

        return Array.FindIndex(cells, c => size[c] > 1);
    }

    private static int[] Identity(int n)
    {
        var identity = new int[n];
        for (var v = 0; v < n; v++)
        {
            identity[v] = v;
        }

        return identity;
    }

    private static void UniteCycles(int[] parent, int[] sigma)
    {
        for (var v = 0; v < sigma.Length; v++)
        {
            var a = Root(parent, v);
            var b = Root(parent, sigma[v]);
            if (a != b)
            {
                parent[Math.Max(a, b)] = Math.Min(a, b);
            }
        }
    }

    private static int Root(int[] parent, int v)
    {
        while (parent[v] != v)
        {
            parent[v] = parent[parent[v]];
            v = parent[v];
        }

        return v;
    }
}
