using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;

namespace ConsistencyHost.Chemistry.Perception.Stereo;

/// <summary>Double bonds that can be E/Z: acyclic, non-aromatic, each end with two different ligands.</summary>
internal static class DoubleBondCandidates
{
    public static List<DoubleBondElement> Find(SymmetryContext ctx)
    {
        var m = ctx.Molecule;
        var result = new List<DoubleBondElement>();
        for (var i = 0; i < m.Bonds.Length; i++)
        {
            var bond = m.Bonds[i];
            if (bond.Order != 2 || ctx.Aromaticity.AromaticBonds[i] || ctx.Rings.BondInRing[i])
            {
                continue;
            }

            var (begin, beginDiffers) = Reference(ctx, bond.Begin, bond.End);
            var (end, endDiffers) = Reference(ctx, bond.End, bond.Begin);
            if (begin < 0 || end < 0)
            {
                continue;
            }

            result.Add(beginDiffers && endDiffers
                ? Specified(m, i) ?? new DoubleBondElement(bond.Begin, bond.End, begin, end, 0, false)
                : new DoubleBondElement(bond.Begin, bond.End, begin, end, 0, true, Stereogenic: false));
        }

        return result;
    }

    /// <summary>A reference substituent of <paramref name="atom"/> (-1 when none) and whether its two ligands differ.</summary>
    private static (int Atom, bool Differs) Reference(SymmetryContext ctx, int atom, int across)
    {
        var m = ctx.Molecule;
        var a = m.Atoms[atom];
        if (a.AtomicNumber is not (6 or 7) || m.BondOrderSum(atom) + a.HydrogenCount - (a.AtomicNumber == 7 ? a.Charge : 0) != (a.AtomicNumber == 6 ? 4 : 3))
        {
            return (-1, false);
        }

        var others = new List<int>();
        foreach (var x in m.Neighbours(atom))
        {
            if (x != across)
            {
                others.Add(x);
            }
        }

        var ligands = others.Count + a.HydrogenCount + (a.AtomicNumber == 7 && a.Charge == 0 ? 1 : 0);
        if (ligands != 2 || others.Count == 0)
        {
            return (-1, false);
        }

        if (others.Count == 2)
        {
            if (ctx.Cells[others[0]] != ctx.Cells[others[1]])
            {
                return (others[0], true);
            }

            var cells = ctx.Refiner.Individualise(ctx.Cells, atom);
            return (others[0], cells[others[0]] != cells[others[1]]);
        }

        return (others[0], true);
    }

    private static DoubleBondElement? Specified(Molecule m, int bond)
    {
        foreach (var d in m.DoubleBondStereo)
        {
            if (d.Bond != bond)
            {
                continue;
            }

            var b = m.Bonds[bond];
            var parity = d.Configuration == DoubleBondConfiguration.Cis ? 0 : 1;
            return new DoubleBondElement(b.Begin, b.End, d.BeginReference, d.EndReference, parity, true);
        }

        return null;
    }
}
