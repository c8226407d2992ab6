namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Individualisation–refinement search for one automorphism with prescribed images and a side condition.</summary>
/// <remarks>McKay, "Practical graph isomorphism", Congressus Numerantium 30, 45–87 (1981): two copies of the
/// equitable partition are individualised in step (x in one, each candidate y in the other), refined, and
/// compared; a discrete pair defines a map that is accepted only after checking every vertex colour and bond.
/// Because refinement is equivariant, an automorphism with the prescribed images is found whenever one exists
/// (up to the node budget), so a merge is proved by an explicit automorphism and a failure is a proof of
/// inequivalence.</remarks>
internal sealed class AutomorphismSearch
{
    private const int NodeBudget = 20_000;
    private const int ConditionalNodeBudget = 4_000;
    private readonly ColouredGraph graph;
    private readonly PartitionRefiner refiner;
    private Func<int[], bool> accept = _ => true;
    private Func<int[], int[], bool>? feasible;
    private readonly int[] scratch;
    private int nodes;
    private int budget = NodeBudget;

    public AutomorphismSearch(ColouredGraph graph, PartitionRefiner refiner)
    {
        this.graph = graph;
        this.refiner = refiner;
        scratch = new int[graph.Count + 1];
    }

    /// <summary>True when some search ran out of budget (the answer "not found" is then not a proof).</summary>
    public bool BudgetExceeded { get; private set; }

    /// <summary>Finds σ with σ(from[i]) = to[i] for all i that satisfies <paramref name="condition"/>, or null.</summary>
    /// <param name="start">Equitable partition to start from (both copies).</param>
    /// <param name="from">Vertices whose images are prescribed.</param>
    /// <param name="to">Their images.</param>
    /// <param name="condition">Side condition checked on each complete automorphism.</param>
    /// <param name="prune">Optional test on a pair of partial partitions: false when no completion can satisfy the
    /// condition (stereo parities already decided by singleton cells), which cuts the subtree.</param>
    public int[]? Find(int[] start, IReadOnlyList<int> from, IReadOnlyList<int> to, Func<int[], bool>? condition = null,
        Func<int[], int[], bool>? prune = null)
    {
        accept = condition ?? (_ => true);
        feasible = prune;
        budget = condition is null ? NodeBudget : ConditionalNodeBudget;
        nodes = 0;
        var a = start;
        var b = start;
        for (var i = 0; i < from.Count; i++)
        {
            if (a[from[i]] != b[to[i]])
            {
                return null;
            }

            a = refiner.Individualise(a, from[i]);
            b = refiner.Individualise(b, to[i]);
            if (!Compatible(a, b))
            {
                return null;
            }
        }

        return Search(a, b);
    }

    private int[]? Search(int[] a, int[] b)
    {
        if (++nodes > budget)
        {
            BudgetExceeded = true;
            return null;
        }

        if (feasible is not null && !feasible(a, b))
        {
            return null;
        }

        var target = TargetCell(a, out var x);
        if (target < 0)
        {
            var sigma = Leaf(a, b);
            return sigma is not null && accept(sigma) ? sigma : null;
        }

        var nextA = refiner.Individualise(a, x);
        for (var y = 0; y < b.Length; y++)
        {
            if (b[y] != target)
            {
                continue;
            }

            var nextB = refiner.Individualise(b, y);
            if (Compatible(nextA, nextB) && Search(nextA, nextB) is { } found)
            {
                return found;
            }

            if (BudgetExceeded)
            {
                return null;
            }
        }

        return null;
    }

    /// <summary>First cell (lowest number) with more than one vertex, and its first vertex; -1 when discrete.</summary>
    private int TargetCell(int[] cells, out int first)
    {
        var size = scratch;
        Array.Clear(size);
        foreach (var c in cells)
        {
            size[c]++;
        }

        first = -1;
        var target = -1;
        for (var c = 0; c < size.Length; c++)
        {
            if (size[c] > 1)
            {
                target = c;
                break;
            }
        }

        if (target >= 0)
        {
            first = Array.IndexOf(cells, target);
        }

        return target;
    }

    private bool Compatible(int[] a, int[] b)
    {
        var count = scratch;
        Array.Clear(count);
        for (var v = 0; v < a.Length; v++)
        {
            count[a[v]]++;
            count[b[v]]--;
        }

        return Array.TrueForAll(count, c => c == 0);
    }

    private int[]? Leaf(int[] a, int[] b)
    {
        var byCell = new int[b.Length];
        for (var v = 0; v < b.Length; v++)
        {
            byCell[b[v]] = v;
        }

        var sigma = new int[a.Length];
        for (var v = 0; v < a.Length; v++)
        {
            sigma[v] = byCell[a[v]];
        }

        return IsAutomorphism(sigma) ? sigma : null;
    }

    private bool IsAutomorphism(int[] sigma)
    {
        for (var v = 0; v < sigma.Length; v++)
        {
            if (graph.Invariant[v] != graph.Invariant[sigma[v]])
            {
                return false;
            }

            for (var k = graph.Start[v]; k < graph.Start[v + 1]; k++)
            {
                if (graph.ColourBetween(sigma[v], sigma[graph.Adjacent[k]]) != graph.EdgeColour[k])
                {
                    return false;
                }
            }
        }

        return true;
    }
}
