using ConsistencyHost.Chemistry.Perception.Stereo;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Drops the configurations that bridged ring systems cannot adopt.</summary>
/// <remarks>The bridgeheads of a bridged system (adamantane CH, hexamine and Tröger's base N) are not free: the
/// bridges fix them in the one strain-free geometry, in which every bridgehead points its H or lone pair out of
/// the cage. That geometry keeps the most symmetry the constitution allows, so for each assignment of the free
/// elements only the bridgehead assignment with the fewest classes is kept (hand analysis of 1-acetyladamantane
/// and N-methylhexaminium in issue 16: the enumerated alternatives are in/out isomers no small cage can form).</remarks>
internal static class RingFixedConfigurations
{
    public static (List<ConfigurationStats>, List<(List<TetrahedralElement>, List<DoubleBondElement>)>) KeepMostSymmetric(
        List<ConfigurationStats> stats, List<(List<TetrahedralElement> Tetra, List<DoubleBondElement> Doubles)> elements)
    {
        if (stats.Count < 2 || !elements[0].Tetra.Exists(t => t.FixedByRings && !t.Specified))
        {
            return (stats, elements);
        }

        var best = new Dictionary<string, int>();
        for (var i = 0; i < stats.Count; i++)
        {
            var key = FreeAssignment(elements[i]);
            if (!best.TryGetValue(key, out var j)
                || (stats[i].HydrogenClassCount, stats[i].CarbonClassCount).CompareTo((stats[j].HydrogenClassCount, stats[j].CarbonClassCount)) < 0)
            {
                best[key] = i;
            }
        }

        var kept = best.Values.Order().ToList();
        return ([.. kept.Select(i => stats[i])], [.. kept.Select(i => elements[i])]);
    }

    private static string FreeAssignment((List<TetrahedralElement> Tetra, List<DoubleBondElement> Doubles) config) =>
        string.Concat(config.Tetra.Where(t => !t.FixedByRings).Select(t => t.Parity))
        + "|" + string.Concat(config.Doubles.Select(d => d.Parity));
}
