using System.Collections.Immutable;

namespace ConsistencyHost.Chemistry.Model;

/// <summary>An immutable molecular graph with stereo descriptors; build one with <see cref="MoleculeBuilder"/>.</summary>
/// <remarks>Adjacency is held in compressed sparse row form (one offset array, one neighbour array, one bond
/// array) so that perception algorithms walk plain arrays. Neighbours of an atom appear in bond order.</remarks>
public sealed class Molecule
{
    private readonly int[] adjacencyStart;
    private readonly int[] adjacentAtoms;
    private readonly int[] adjacentBonds;

    internal Molecule(
        ImmutableArray<Atom> atoms,
        ImmutableArray<Bond> bonds,
        ImmutableArray<TetrahedralStereo> tetrahedral,
        ImmutableArray<DoubleBondStereo> doubleBonds)
    {
        Atoms = atoms;
        Bonds = bonds;
        TetrahedralStereo = tetrahedral;
        DoubleBondStereo = doubleBonds;
        (adjacencyStart, adjacentAtoms, adjacentBonds) = BuildAdjacency(atoms.Length, bonds);
    }

    /// <summary>Atoms in input order.</summary>
    public ImmutableArray<Atom> Atoms { get; }

    /// <summary>Bonds in input order.</summary>
    public ImmutableArray<Bond> Bonds { get; }

    /// <summary>Specified tetrahedral configurations.</summary>
    public ImmutableArray<TetrahedralStereo> TetrahedralStereo { get; }

    /// <summary>Specified double-bond configurations.</summary>
    public ImmutableArray<DoubleBondStereo> DoubleBondStereo { get; }

    /// <summary>Number of atoms.</summary>
    public int AtomCount => Atoms.Length;

    /// <summary>Neighbours of <paramref name="atom"/>.</summary>
    public ReadOnlySpan<int> Neighbours(int atom) =>
        adjacentAtoms.AsSpan(adjacencyStart[atom], adjacencyStart[atom + 1] - adjacencyStart[atom]);

    /// <summary>Bond indices of <paramref name="atom"/>, parallel to <see cref="Neighbours"/>.</summary>
    public ReadOnlySpan<int> BondsOf(int atom) =>
        adjacentBonds.AsSpan(adjacencyStart[atom], adjacencyStart[atom + 1] - adjacencyStart[atom]);

    /// <summary>Number of explicit neighbours of <paramref name="atom"/>.</summary>
    public int Degree(int atom) => adjacencyStart[atom + 1] - adjacencyStart[atom];

    /// <summary>Index of the bond between a and b, or -1.</summary>
    public int BondBetween(int a, int b)
    {
        var n = Neighbours(a);
        for (var i = 0; i < n.Length; i++)
        {
            if (n[i] == b)
            {
                return adjacentBonds[adjacencyStart[a] + i];
            }
        }

        return -1;
    }

    /// <summary>Sum of bond orders at <paramref name="atom"/> (without hydrogens).</summary>
    public int BondOrderSum(int atom)
    {
        var sum = 0;
        foreach (var b in BondsOf(atom))
        {
            sum += Bonds[b].Order;
        }

        return sum;
    }

    private static (int[] Start, int[] Atoms, int[] Bonds) BuildAdjacency(int n, ImmutableArray<Bond> bonds)
    {
        var start = new int[n + 1];
        foreach (var b in bonds)
        {
            start[b.Begin + 1]++;
            start[b.End + 1]++;
        }

        for (var i = 0; i < n; i++)
        {
            start[i + 1] += start[i];
        }

        var fill = (int[])start.Clone();
        var atoms = new int[bonds.Length * 2];
        var bondIdx = new int[bonds.Length * 2];
        for (var i = 0; i < bonds.Length; i++)
        {
            var b = bonds[i];
            atoms[fill[b.Begin]] = b.End;
            bondIdx[fill[b.Begin]++] = i;
            atoms[fill[b.End]] = b.Begin;
            bondIdx[fill[b.End]++] = i;
        }

        return (start, atoms, bondIdx);
    }
}
