using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Derives cis/trans descriptors from '/' and '\' marks around double bonds (OpenSMILES §3.7).</summary>
internal static class SmilesDoubleBondStereo
{
    /// <param name="m">The molecule as written, before hydrogens are folded.</param>
    /// <param name="problems">Where conflicting marks are reported.</param>
    /// <param name="atomOffsets">Character offset of each atom in the SMILES, so a problem points into the text.</param>
    public static Molecule Add(Molecule m, List<ReadProblem> problems, IReadOnlyList<int> atomOffsets)
    {
        var found = new List<DoubleBondStereo>();
        for (var i = 0; i < m.Bonds.Length; i++)
        {
            var bond = m.Bonds[i];
            if (bond.Order != 2 || bond.IsAromatic)
            {
                continue;
            }

            var begin = Reference(m, bond.Begin, bond.End, problems, atomOffsets);
            var end = Reference(m, bond.End, bond.Begin, problems, atomOffsets);
            if (begin.Atom >= 0 && end.Atom >= 0)
            {
                var config = begin.Side == end.Side ? DoubleBondConfiguration.Cis : DoubleBondConfiguration.Trans;
                found.Add(new DoubleBondStereo(i, begin.Atom, end.Atom, config));
            }
        }

        if (found.Count == 0)
        {
            return m;
        }

        var builder = Copy(m);
        foreach (var d in found)
        {
            builder.AddDoubleBond(d);
        }

        return builder.Build();
    }

    /// <summary>The first marked neighbour of <paramref name="atom"/> and its side: +1 above, -1 below.</summary>
    private static (int Atom, int Side) Reference(Molecule m, int atom, int across, List<ReadProblem> problems, IReadOnlyList<int> atomOffsets)
    {
        var result = (Atom: -1, Side: 0);
        var neighbours = m.Neighbours(atom);
        var bonds = m.BondsOf(atom);
        for (var k = 0; k < neighbours.Length; k++)
        {
            var b = m.Bonds[bonds[k]];
            if (neighbours[k] == across || b.Mark is not (BondStereoMark.Up or BondStereoMark.Down))
            {
                continue;
            }

            // '/' read from Begin to End puts End above Begin; seen from End, Begin is below.
            var up = b.Mark == BondStereoMark.Up ? 1 : -1;
            var side = b.Begin == atom ? up : -up;
            if (result.Atom < 0)
            {
                result = (neighbours[k], side);
            }
            else if (result.Side == side)
            {
                problems.Add(new ReadProblem(ProblemSeverity.Warning,
                    SmilesMessages.Format(SmilesMessages.ConflictingDoubleBondMarks, atom), atomOffsets[atom], AtomIndex: atom));
                return (-1, 0);
            }
        }

        return result;
    }

    private static MoleculeBuilder Copy(Molecule m)
    {
        var builder = new MoleculeBuilder();
        foreach (var a in m.Atoms)
        {
            builder.AddAtom(a);
        }

        foreach (var b in m.Bonds)
        {
            builder.AddBond(b);
        }

        foreach (var t in m.TetrahedralStereo)
        {
            builder.AddTetrahedral(t);
        }

        return builder;
    }
}
