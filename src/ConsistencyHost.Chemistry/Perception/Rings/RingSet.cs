using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Rings;

/// <summary>A smallest set of smallest rings (SSSR) and ring membership of atoms and bonds.</summary>
/// <remarks>Candidate cycles are the shortest cycle through each bond (breadth-first search with the bond
/// removed); they are taken shortest first when linearly independent over GF(2) of the bond space until the
/// cyclomatic number m − n + c is reached (the Horton 1987 selection restricted to bond-generated candidates;
/// exact for the molecules met in practice, not guaranteed for every graph).</remarks>
public sealed class RingSet
{
    private RingSet(ImmutableArray<ImmutableArray<int>> rings, bool[] atomInRing, bool[] bondInRing)
    {
        Rings = rings;
        AtomInRing = [.. atomInRing];
        BondInRing = [.. bondInRing];
    }

    /// <summary>Each ring as its atom indices in cyclic order.</summary>
    public ImmutableArray<ImmutableArray<int>> Rings { get; }

    /// <summary>True for atoms in at least one ring.</summary>
    public ImmutableArray<bool> AtomInRing { get; }

    /// <summary>True for bonds in at least one ring.</summary>
    public ImmutableArray<bool> BondInRing { get; }

    /// <summary>Computes the rings of a molecule.</summary>
    public static RingSet Of(Molecule molecule)
    {
        var candidates = RingCandidates.ShortestCyclesThroughBonds(molecule);
        var target = molecule.Bonds.Length - molecule.AtomCount + Components(molecule);
        var basis = new Gf2Basis(molecule.Bonds.Length);
        var chosen = new List<ImmutableArray<int>>();
        var atomInRing = new bool[molecule.AtomCount];
        var bondInRing = new bool[molecule.Bonds.Length];
        foreach (var (atoms, bonds) in candidates)
        {
            if (chosen.Count >= target)
            {
                break;
            }

            if (basis.AddIfIndependent(bonds))
            {
                chosen.Add([.. atoms]);
                foreach (var a in atoms)
                {
                    atomInRing[a] = true;
                }

                foreach (var b in bonds)
                {
                    bondInRing[b] = true;
                }
            }
        }

        return new RingSet([.. chosen], atomInRing, bondInRing);
    }

    private static int Components(Molecule m)
    {
        var seen = new bool[m.AtomCount];
        var count = 0;
        var stack = new Stack<int>();
        for (var s = 0; s < m.AtomCount; s++)
        {
            if (seen[s])
            {
                continue;
            }

            count++;
            seen[s] = true;
            stack.Push(s);
            while (stack.Count > 0)
            {
                foreach (var x in m.Neighbours(stack.Pop()))
                {
                    if (!seen[x])
                    {
                        seen[x] = true;
                        stack.Push(x);
                    }
                }
            }
        }

        return count;
    }
}
