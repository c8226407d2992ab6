using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Depth-first spanning forest, ring-closure digits and the written neighbour order of every atom.</summary>
internal sealed class SmilesWritePlan
{
    private SmilesWritePlan(int n)
    {
        Children = new List<(int, int)>[n];
        RingDigits = new List<(int, int, bool)>[n];
        Written = new List<int>[n];
        BondFirst = new Dictionary<int, int>();
        for (var i = 0; i < n; i++)
        {
            Children[i] = [];
            RingDigits[i] = [];
            Written[i] = [];
        }
    }

    public List<int> Roots { get; } = [];

    /// <summary>Tree children with their bond, in writing order.</summary>
    public List<(int Child, int Bond)>[] Children { get; }

    /// <summary>Ring-closure digits written after the atom: bond, number, opening?</summary>
    public List<(int Bond, int Number, bool Opening)>[] RingDigits { get; }

    /// <summary>Neighbours in the order the reader will see them (-1 for the bracket H).</summary>
    public List<int>[] Written { get; }

    /// <summary>Bond → atom written first.</summary>
    public Dictionary<int, int> BondFirst { get; }

    public static SmilesWritePlan Create(Molecule m)
    {
        var plan = new SmilesWritePlan(m.AtomCount);
        var visited = new bool[m.AtomCount];
        var treeBond = new bool[m.Bonds.Length];
        var ringBonds = new List<(int Bond, int Open, int Close)>();
        var preorder = new List<int>();
        for (var root = 0; root < m.AtomCount; root++)
        {
            if (!visited[root])
            {
                plan.Roots.Add(root);
                plan.Visit(m, root, -1, visited, treeBond, ringBonds, preorder);
            }
        }

        plan.AssignDigits(m, ringBonds, preorder);
        return plan;
    }

    private void Visit(Molecule m, int v, int parentBond, bool[] visited, bool[] treeBond, List<(int, int, int)> ringBonds, List<int> preorder)
    {
        visited[v] = true;
        preorder.Add(v);
        var n = m.Neighbours(v);
        var b = m.BondsOf(v);
        for (var k = 0; k < n.Length; k++)
        {
            if (b[k] == parentBond || treeBond[b[k]])
            {
                continue;
            }

            if (!visited[n[k]])
            {
                treeBond[b[k]] = true;
                Children[v].Add((n[k], b[k]));
                BondFirst[b[k]] = v;
                Visit(m, n[k], b[k], visited, treeBond, ringBonds, preorder);
            }
            else if (!BondFirst.ContainsKey(b[k]))
            {
                BondFirst[b[k]] = n[k];
                ringBonds.Add((b[k], n[k], v));
            }
        }
    }

    private void AssignDigits(Molecule m, List<(int Bond, int Open, int Close)> ringBonds, List<int> preorder)
    {
        var inUse = new SortedSet<int>();
        var numberOf = new Dictionary<int, int>();
        var position = new int[m.AtomCount];
        for (var i = 0; i < preorder.Count; i++)
        {
            position[preorder[i]] = i;
        }

        foreach (var v in preorder)
        {
            foreach (var (bond, open, close) in ringBonds.Where(r => r.Close == v).OrderBy(r => position[r.Open]))
            {
                RingDigits[v].Add((bond, numberOf[bond], false));
                inUse.Remove(numberOf[bond]);
            }

            foreach (var (bond, _, _) in ringBonds.Where(r => r.Open == v).OrderBy(r => position[r.Close]))
            {
                var number = Enumerable.Range(1, 99).First(x => !inUse.Contains(x));
                inUse.Add(number);
                numberOf[bond] = number;
                RingDigits[v].Add((bond, number, true));
            }
        }

        BuildWrittenOrder(m, preorder);
    }

    private void BuildWrittenOrder(Molecule m, List<int> preorder)
    {
        var parent = new int[m.AtomCount];
        Array.Fill(parent, -1);
        foreach (var v in preorder)
        {
            foreach (var (child, _) in Children[v])
            {
                parent[child] = v;
            }
        }

        foreach (var v in preorder)
        {
            if (parent[v] >= 0)
            {
                Written[v].Add(parent[v]);
            }

            if (m.Atoms[v].HydrogenCount > 0)
            {
                Written[v].Add(TetrahedralStereo.ImplicitHydrogen);
            }

            foreach (var (bond, _, _) in RingDigits[v])
            {
                Written[v].Add(m.Bonds[bond].Other(v));
            }

            Written[v].AddRange(Children[v].Select(c => c.Child));
        }
    }

    /// <summary>"@", "@@" or "" for the atom's configuration in written neighbour order.</summary>
    public string Chirality(Molecule m, int atom)
    {
        var t = m.TetrahedralStereo.FirstOrDefault(x => x.Centre == atom);
        if (t is null)
        {
            return string.Empty;
        }

        var written = new List<int>(Written[atom]);
        if (written.Count == 3 && t.Neighbours.Contains(TetrahedralStereo.ImplicitHydrogen))
        {
            written.Insert(written.Count > 0 && Written[atom].Count > 0 && Roots.Contains(atom) ? 0 : 1, TetrahedralStereo.ImplicitHydrogen);
        }

        if (written.Count != 4 || !written.Order().SequenceEqual(t.Neighbours.Order()))
        {
            return string.Empty;
        }

        var p = written.Select(x => t.Neighbours.IndexOf(x)).ToArray();
        var odd = false;
        for (var i = 0; i < 4; i++)
        {
            for (var j = i + 1; j < 4; j++)
            {
                odd ^= p[i] > p[j];
            }
        }

        var winding = odd ? TetrahedralStereo.Invert(t.Winding) : t.Winding;
        return winding == TetrahedralWinding.Anticlockwise ? "@" : "@@";
    }
}
