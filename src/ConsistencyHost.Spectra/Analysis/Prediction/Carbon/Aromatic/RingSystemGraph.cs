namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>Aromatic ring systems of a molecule (atoms joined by aromatic bonds) and their adjacency.</summary>
internal static class RingSystemGraph
{
    /// <summary>The ring systems as lists of atom indices.</summary>
    public static List<int[]> Systems(PredictionContext context)
    {
        var m = context.Molecule;
        var systems = new List<int[]>();
        var seen = new bool[m.AtomCount];
        var stack = new Stack<int>();
        var members = new List<int>();
        for (var start = 0; start < m.AtomCount; start++)
        {
            if (seen[start] || !context.IsAromatic(start))
            {
                continue;
            }

            members.Clear();
            seen[start] = true;
            stack.Push(start);
            while (stack.Count > 0)
            {
                var a = stack.Pop();
                members.Add(a);
                foreach (var x in m.Neighbours(a))
                {
                    if (!seen[x] && context.IsAromatic(x) && context.IsAromaticBond(a, x))
                    {
                        seen[x] = true;
                        stack.Push(x);
                    }
                }
            }

            systems.Add([.. members]);
        }

        return systems;
    }

    /// <summary>Bonded pairs among <paramref name="atoms"/>, by position.</summary>
    public static bool[,] Adjacency(PredictionContext context, RingSystemAtom[] atoms)
    {
        var n = atoms.Length;
        var adjacent = new bool[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                if (context.Molecule.BondBetween(atoms[i].Index, atoms[j].Index) >= 0)
                {
                    adjacent[i, j] = adjacent[j, i] = true;
                }
            }
        }

        return adjacent;
    }
}
