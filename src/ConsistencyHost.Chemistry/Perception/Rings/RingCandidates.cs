using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Rings;

/// <summary>Shortest cycle through each bond, sorted by size.</summary>
internal static class RingCandidates
{
    public static List<(int[] Atoms, int[] Bonds)> ShortestCyclesThroughBonds(Molecule m)
    {
        var result = new List<(int[], int[])>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var parent = new int[m.AtomCount];
        var parentBond = new int[m.AtomCount];
        var queue = new Queue<int>();
        for (var b = 0; b < m.Bonds.Length; b++)
        {
            var path = ShortestPath(m, m.Bonds[b].Begin, m.Bonds[b].End, b, parent, parentBond, queue);
            if (path is null)
            {
                continue;
            }

            var (atoms, bonds) = path.Value;
            bonds.Add(b);
            var key = string.Join(',', bonds.Order());
            if (seen.Add(key))
            {
                result.Add(([.. atoms], [.. bonds]));
            }
        }

        result.Sort((x, y) => x.Item1.Length.CompareTo(y.Item1.Length));
        return result;
    }

    private static (List<int> Atoms, List<int> Bonds)? ShortestPath(
        Molecule m, int from, int to, int skipBond, int[] parent, int[] parentBond, Queue<int> queue)
    {
        Array.Fill(parent, -2);
        parent[from] = -1;
        queue.Clear();
        queue.Enqueue(from);
        while (queue.Count > 0)
        {
            var v = queue.Dequeue();
            var neighbours = m.Neighbours(v);
            var bonds = m.BondsOf(v);
            for (var k = 0; k < neighbours.Length; k++)
            {
                var w = neighbours[k];
                if (bonds[k] == skipBond || parent[w] != -2)
                {
                    continue;
                }

                parent[w] = v;
                parentBond[w] = bonds[k];
                if (w == to)
                {
                    return Trace(from, to, parent, parentBond);
                }

                queue.Enqueue(w);
            }
        }

        return null;
    }

    private static (List<int>, List<int>) Trace(int from, int to, int[] parent, int[] parentBond)
    {
        var atoms = new List<int>();
        var bonds = new List<int>();
        for (var v = to; v != from; v = parent[v])
        {
            atoms.Add(v);
            bonds.Add(parentBond[v]);
        }

        atoms.Add(from);
        return (atoms, bonds);
    }
}
