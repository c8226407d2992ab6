namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Maps a template onto a molecule's ring system of the same size and kind counts: a backtracking isomorphism
/// search (template atoms in SMILES order, each checked against its already-mapped neighbours).
/// </summary>
internal static class TemplateMatcher
{
    /// <summary>For each template atom, the position of its match in <paramref name="system"/>; null when none.</summary>
    public static int[]? Match(RingTemplate template, RingSystemAtom[] system, bool[,] adjacency)
    {
        if (template.Atoms.Length != system.Length || template.Signature != RingSystemAtom.Signature(system))
        {
            return null;
        }

        var map = new int[system.Length];
        var used = new bool[system.Length];
        return Extend(template, system, adjacency, 0, map, used) ? map : null;
    }

    private static bool Extend(RingTemplate template, RingSystemAtom[] system, bool[,] adjacency, int t, int[] map, bool[] used)
    {
        if (t == map.Length)
        {
            return true;
        }

        var wanted = template.Atoms[t];
        for (var j = 0; j < system.Length; j++)
        {
            if (used[j] || system[j].Kind != wanted.Kind || system[j].SystemDegree != wanted.SystemDegree
                || !ConsistentWithMapped(template, adjacency, t, j, map))
            {
                continue;
            }

            map[t] = j;
            used[j] = true;
            if (Extend(template, system, adjacency, t + 1, map, used))
            {
                return true;
            }

            used[j] = false;
        }

        return false;
    }

    private static bool ConsistentWithMapped(RingTemplate template, bool[,] adjacency, int t, int j, int[] map)
    {
        for (var u = 0; u < t; u++)
        {
            if (template.Adjacency[t, u] != adjacency[j, map[u]])
            {
                return false;
            }
        }

        return true;
    }
}
