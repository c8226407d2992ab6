using System.Collections.Immutable;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Turns per-atom class ids into sorted class lists ordered by their smallest member.</summary>
internal static class SymmetryClassLists
{
    public static ImmutableArray<ImmutableArray<int>> FromOrbitIds(IReadOnlyList<int> ids)
    {
        var groups = new Dictionary<int, List<int>>();
        var order = new List<int>();
        for (var v = 0; v < ids.Count; v++)
        {
            if (!groups.TryGetValue(ids[v], out var list))
            {
                groups[ids[v]] = list = [];
                order.Add(ids[v]);
            }

            list.Add(v);
        }

        var result = ImmutableArray.CreateBuilder<ImmutableArray<int>>(order.Count);
        foreach (var id in order)
        {
            result.Add([.. groups[id]]);
        }

        return result.MoveToImmutable();
    }
}
