using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Builds hydrogen classes from heavy-atom orbits: each H inherits its parent's orbit; a diastereotopic
/// CH2 orbit gives two classes with one H per parent each.</summary>
internal static class HydrogenClassBuilder
{
    public static List<HydrogenClass> Build(Molecule m, ConfigurationSymmetry s)
    {
        var members = new Dictionary<int, List<int>>();
        for (var v = 0; v < m.AtomCount; v++)
        {
            if (m.Atoms[v].HydrogenCount > 0)
            {
                if (!members.TryGetValue(s.Orbit[v], out var list))
                {
                    members[s.Orbit[v]] = list = [];
                }

                list.Add(v);
            }
        }

        var classes = new List<HydrogenClass>();
        foreach (var (rep, atoms) in members.OrderBy(kv => kv.Value[0]))
        {
            var split = s.SplitHydrogens[rep];
            var perParent = split ? 1 : m.Atoms[rep].HydrogenCount;
            var parents = new List<int>();
            foreach (var a in atoms)
            {
                parents.AddRange(Enumerable.Repeat(a, perParent));
            }

            var exchangeable = ConfigurationStats.IsExchangeableParent(m.Atoms[rep]);
            for (var copy = 0; copy < (split ? 2 : 1); copy++)
            {
                classes.Add(new HydrogenClass(classes.Count, [.. parents], exchangeable, split, [], [], [], []));
            }
        }

        return classes;
    }
}
