namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Equitable partition refinement (1-dimensional Weisfeiler–Leman) with bond-coloured neighbour counts.</summary>
/// <remarks>Each round sorts atoms by (cell, sorted multiset of neighbour cell × bond colour) and renumbers cells
/// densely in that order, until the number of cells stops growing. Cell numbers depend only on invariants, never
/// on input order, so refinement commutes with every automorphism — the property the search relies on
/// (McKay 1981; Weininger et al. 1989 for the chemical use).</remarks>
internal sealed class PartitionRefiner
{
    private readonly ColouredGraph graph;
    private readonly ulong[] signature;
    private readonly int[] order;
    private readonly int[] cellStart;
    private readonly int[] fill;
    private readonly IComparer<int> comparer;
    private int[] current = [];

    public PartitionRefiner(ColouredGraph graph)
    {
        this.graph = graph;
        signature = new ulong[graph.Adjacent.Length];
        order = new int[graph.Count];
        cellStart = new int[graph.Count + 1];
        fill = new int[graph.Count];
        comparer = Comparer<int>.Create((a, b) => Compare(current, a, b));
    }

    /// <summary>Initial cells from vertex invariants plus an optional extra colour per vertex.</summary>
    public int[] Initial(ulong[]? extra = null)
    {
        var keys = new ulong[graph.Count];
        for (var v = 0; v < graph.Count; v++)
        {
            keys[v] = graph.Invariant[v];
        }

        var cells = DenseRank(keys, out _);
        if (extra is null)
        {
            return Refine(cells);
        }

        var combined = new ulong[graph.Count];
        for (var v = 0; v < graph.Count; v++)
        {
            combined[v] = ((ulong)(uint)cells[v] << 32) | (extra[v] & 0xFFFFFFFF);
        }

        return Refine(DenseRank(combined, out _));
    }

    /// <summary>Gives <paramref name="vertex"/> a cell of its own (placed before the rest of its cell) and refines.</summary>
    public int[] Individualise(int[] cells, int vertex)
    {
        // Cells are dense ranks: the vertex keeps its cell number, the rest of its cell and every later cell
        // move up by one. Same result as re-ranking (2·cell + [v ≠ vertex]) without a sort.
        var c = cells[vertex];
        var next = new int[cells.Length];
        for (var v = 0; v < cells.Length; v++)
        {
            next[v] = cells[v] > c || (cells[v] == c && v != vertex) ? cells[v] + 1 : cells[v];
        }

        return Refine(Densify(next));
    }

    /// <summary>Closes the gap left when the individualised vertex was alone in its cell.</summary>
    private static int[] Densify(int[] cells)
    {
        var used = new bool[cells.Length + 1];
        foreach (var c in cells)
        {
            used[c] = true;
        }

        var map = new int[used.Length];
        var rank = 0;
        for (var c = 0; c < used.Length; c++)
        {
            map[c] = rank;
            rank += used[c] ? 1 : 0;
        }

        for (var v = 0; v < cells.Length; v++)
        {
            cells[v] = map[cells[v]];
        }

        return cells;
    }

    public int[] Refine(int[] cells)
    {
        var count = CountCells(cells);
        while (true)
        {
            var next = Round(cells, out var nextCount);
            if (nextCount == count)
            {
                return next;
            }

            cells = next;
            count = nextCount;
        }
    }

    public static int CountCells(int[] cells)
    {
        var max = -1;
        foreach (var c in cells)
        {
            max = Math.Max(max, c);
        }

        return max + 1;
    }

    /// <summary>One refinement round. The new order is (old cell, sorted neighbour signature), as if the whole
    /// vertex set were sorted by that key; since the old cell is the first key, only the members of each
    /// non-singleton cell need sorting, and singleton cells keep their place without a signature.</summary>
    private int[] Round(int[] cells, out int count)
    {
        var n = graph.Count;
        var cellCount = CountCells(cells);
        GroupByCell(cells, cellCount);
        current = cells;
        var result = new int[n];
        var rank = -1;
        for (var c = 0; c < cellCount; c++)
        {
            var from = cellStart[c];
            var length = cellStart[c + 1] - from;
            if (length > 1)
            {
                for (var i = from; i < from + length; i++)
                {
                    Sign(cells, order[i]);
                }

                Array.Sort(order, from, length, comparer);
            }

            for (var i = from; i < from + length; i++)
            {
                rank += i == from || Compare(cells, order[i - 1], order[i]) != 0 ? 1 : 0;
                result[order[i]] = rank;
            }
        }

        count = rank + 1;
        return result;
    }

    /// <summary>Counting sort of the vertices by cell into <see cref="order"/>; cell c occupies
    /// order[cellStart[c]..cellStart[c + 1]).</summary>
    private void GroupByCell(int[] cells, int cellCount)
    {
        Array.Clear(cellStart, 0, cellCount + 1);
        foreach (var c in cells)
        {
            cellStart[c + 1]++;
        }

        for (var c = 0; c < cellCount; c++)
        {
            cellStart[c + 1] += cellStart[c];
            fill[c] = cellStart[c];
        }

        for (var v = 0; v < cells.Length; v++)
        {
            order[fill[cells[v]]++] = v;
        }
    }

    /// <summary>The sorted multiset of (neighbour cell, bond colour) of <paramref name="v"/>, in its CSR slice.</summary>
    private void Sign(int[] cells, int v)
    {
        for (var k = graph.Start[v]; k < graph.Start[v + 1]; k++)
        {
            signature[k] = ((ulong)(uint)cells[graph.Adjacent[k]] << 3) | (ulong)(uint)graph.EdgeColour[k];
        }

        Array.Sort(signature, graph.Start[v], graph.Degree(v));
    }

    private int Compare(int[] cells, int a, int b)
    {
        var c = cells[a].CompareTo(cells[b]);
        if (c != 0)
        {
            return c;
        }

        var da = graph.Degree(a);
        c = da.CompareTo(graph.Degree(b));
        for (var k = 0; c == 0 && k < da; k++)
        {
            c = signature[graph.Start[a] + k].CompareTo(signature[graph.Start[b] + k]);
        }

        return c;
    }

    private static int[] DenseRank(ulong[] keys, out int count)
    {
        var idx = new int[keys.Length];
        for (var i = 0; i < idx.Length; i++)
        {
            idx[i] = i;
        }

        Array.Sort((ulong[])keys.Clone(), idx);
        var cells = new int[keys.Length];
        var rank = 0;
        for (var i = 0; i < idx.Length; i++)
        {
            if (i > 0 && keys[idx[i]] != keys[idx[i - 1]])
            {
                rank++;
            }

            cells[idx[i]] = rank;
        }

        count = keys.Length == 0 ? 0 : rank + 1;
        return cells;
    }
}
