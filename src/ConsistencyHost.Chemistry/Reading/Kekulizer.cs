namespace ConsistencyHost.Chemistry.Reading;

/// <summary>Assigns alternating double bonds to aromatic bonds: a perfect matching of the atoms that need a π bond.</summary>
/// <remarks>Backtracking search over the aromatic subgraph, always extending the atom with the fewest free
/// candidates (forced choices first), which makes fused ring systems linear in practice. A step budget bounds
/// pathological inputs; exceeding it is reported as a failure.</remarks>
internal sealed class Kekulizer
{
    private const int StepBudget = 200_000;
    private readonly int atomCount;
    private readonly List<(int Other, int Bond)>[] edges;
    private readonly bool[] needs;
    private readonly int[] matchedBond;
    private int steps;

    private Kekulizer(int atomCount, bool[] needs)
    {
        this.atomCount = atomCount;
        this.needs = needs;
        edges = new List<(int, int)>[atomCount];
        for (var i = 0; i < atomCount; i++)
        {
            edges[i] = [];
        }

        matchedBond = new int[atomCount];
        Array.Fill(matchedBond, -1);
    }

    /// <summary>Returns the bonds to make double, or the first unmatched atom when no matching exists.</summary>
    public static (IReadOnlyList<int> DoubleBonds, int FailedAtom) Solve(
        int atomCount, bool[] needsPi, IReadOnlyList<(int Begin, int End, int Bond)> aromaticBonds)
    {
        var k = new Kekulizer(atomCount, needsPi);
        foreach (var (a, b, bond) in aromaticBonds)
        {
            if (needsPi[a] && needsPi[b])
            {
                k.edges[a].Add((b, bond));
                k.edges[b].Add((a, bond));
            }
        }

        if (k.Search())
        {
            var result = new HashSet<int>();
            for (var i = 0; i < atomCount; i++)
            {
                if (k.matchedBond[i] >= 0)
                {
                    result.Add(k.matchedBond[i]);
                }
            }

            return ([.. result], -1);
        }

        return ([], k.FirstUnmatched());
    }

    private bool Search()
    {
        if (++steps > StepBudget)
        {
            return false;
        }

        var (atom, free) = MostConstrained();
        if (atom < 0)
        {
            return true;
        }

        if (free == 0)
        {
            return false;
        }

        foreach (var (other, bond) in edges[atom])
        {
            if (matchedBond[other] >= 0 || !needs[other])
            {
                continue;
            }

            matchedBond[atom] = bond;
            matchedBond[other] = bond;
            if (Search())
            {
                return true;
            }

            matchedBond[atom] = -1;
            matchedBond[other] = -1;
        }

        return false;
    }

    private (int Atom, int Free) MostConstrained()
    {
        var best = -1;
        var bestFree = int.MaxValue;
        for (var i = 0; i < atomCount; i++)
        {
            if (!needs[i] || matchedBond[i] >= 0)
            {
                continue;
            }

            var free = 0;
            foreach (var (other, _) in edges[i])
            {
                if (matchedBond[other] < 0)
                {
                    free++;
                }
            }

            if (free < bestFree)
            {
                best = i;
                bestFree = free;
                if (free <= 1)
                {
                    break;
                }
            }
        }

        return (best, bestFree);
    }

    private int FirstUnmatched()
    {
        for (var i = 0; i < atomCount; i++)
        {
            if (needs[i] && (matchedBond[i] < 0 || edges[i].Count == 0))
            {
                return i;
            }
        }

        return Array.IndexOf(needs, true);
    }
}
