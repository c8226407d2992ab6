using System.Collections.Immutable;

namespace ConsistencyHost.Chemistry.Model;

/// <summary>Mutable builder for <see cref="Molecule"/>; readers fill it and call <see cref="Build"/> once.</summary>
public sealed class MoleculeBuilder
{
    private readonly List<Atom> atoms = [];
    private readonly List<Bond> bonds = [];
    private readonly List<TetrahedralStereo> tetrahedral = [];
    private readonly List<DoubleBondStereo> doubleBonds = [];

    /// <summary>Number of atoms added so far.</summary>
    public int AtomCount => atoms.Count;

    /// <summary>Number of bonds added so far.</summary>
    public int BondCount => bonds.Count;

    /// <summary>Adds an atom and returns its index.</summary>
    public int AddAtom(Atom atom)
    {
        atoms.Add(atom);
        return atoms.Count - 1;
    }

    /// <summary>Adds a bond and returns its index.</summary>
    public int AddBond(Bond bond)
    {
        if (bond.Begin == bond.End || (uint)bond.Begin >= (uint)atoms.Count || (uint)bond.End >= (uint)atoms.Count)
        {
            throw new ArgumentOutOfRangeException(nameof(bond), "Bond atoms must be distinct existing atoms.");
        }

        bonds.Add(bond);
        return bonds.Count - 1;
    }

    /// <summary>Gets an atom.</summary>
    public Atom GetAtom(int index) => atoms[index];

    /// <summary>Replaces an atom (e.g. to set its hydrogen count after the valence model ran).</summary>
    public void SetAtom(int index, Atom atom) => atoms[index] = atom;

    /// <summary>Gets a bond.</summary>
    public Bond GetBond(int index) => bonds[index];

    /// <summary>Replaces a bond (e.g. to set a Kekulé order).</summary>
    public void SetBond(int index, Bond bond) => bonds[index] = bond;

    /// <summary>Adds a tetrahedral configuration.</summary>
    public void AddTetrahedral(TetrahedralStereo stereo) => tetrahedral.Add(stereo);

    /// <summary>Adds a double-bond configuration.</summary>
    public void AddDoubleBond(DoubleBondStereo stereo) => doubleBonds.Add(stereo);

    /// <summary>Creates the immutable molecule.</summary>
    public Molecule Build() =>
        new([.. atoms], [.. bonds], [.. tetrahedral], [.. doubleBonds]);
}
