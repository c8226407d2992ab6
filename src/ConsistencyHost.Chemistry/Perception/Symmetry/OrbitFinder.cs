namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Orbits of a group of automorphisms given by a membership condition, via union–find over found maps.</summary>
/// <remarks>For each cell of the equitable partition, each vertex is tested against the representatives of the
/// orbits already found in its cell; each automorphism found unites all its cycles at once, which usually
/// settles most of the cell in one step.</remarks>
internal static class OrbitFinder
{
    public static int[] Orbits(AutomorphismSearch search, int[] cells, Func<int[], bool>? condition, Func<int[], int[], bool>? prune = null)
    {
        var n = cells.Length;
        var parent = new int[n];
        for (var i = 0; i < n; i++)
        {
            parent[i] = i;
        }

        var representatives = new Dictionary<int, List<int>>();
        for (var v = 0; v < n; v++)
        {
            if (!representatives.TryGetValue(cells[v], out var reps))
            {
                representatives[cells[v]] = [v];
                continue;
            }

            if (!TryJoin(search, cells, condition, prune, parent, reps, v))
            {
                reps.Add(v);
            }
        }

        var orbit = new int[n];
        for (var v = 0; v < n; v++)
        {
            orbit[v] = Find(parent, v);
        }

        return orbit;
    }

    private static bool TryJoin(AutomorphismSearch search, int[] cells, Func<int[], bool>? condition, Func<int[], int[], bool>? prune, int[] parent, List<int> reps, int v)
    {
        foreach (var r in reps)
        {
            if (Find(parent, r) == Find(parent, v))
            {
                return true;
            }
        }

        foreach (var r in reps)
        {
            if (search.Find(cells, [r], [v], condition, prune) is { } sigma)
            {
                for (var a = 0; a < sigma.Length; a++)
                {
                    Union(parent, a, sigma[a]);
                }

                return true;
            }
        }

        return false;
    }

    private static int Find(int[] parent, int v)
    {
        while (parent[v] != v)
        {
            parent[v] = parent[parent[v]];
            v = parent[v];
        }

        return v;
    }

    private static void Union(int[] parent, int a, int b)
    {
        var ra = Find(parent, a);
        var rb = Find(parent, b);
        if (ra != rb)
        {
            parent[Math.Max(ra, rb)] = Math.Min(ra, rb);
        }
    }
}
