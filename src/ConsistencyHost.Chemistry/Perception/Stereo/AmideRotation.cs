using ConsistencyHost.Chemistry.Perception.Symmetry;

namespace ConsistencyHost.Chemistry.Perception.Stereo;

/// <summary>Amide, carbamate, urea and thioamide C–N bonds whose rotation is slow on the NMR time scale.</summary>
/// <remarks>nmr-methods.md §2.6: slow rotation about the partial C–N double bond doubles N-substituent signals
/// (DMF shows two N-CH3 singlets at room temperature; Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512
/// lists them at 2.96 and 2.88 ppm in CDCl3). Modelled as an upper bound: the C–N bond becomes a fixed
/// double-bond element (tertiary N), and a primary amide's NH2 protons become two classes (cis/trans to O).</remarks>
internal static class AmideRotation
{
    public static (List<DoubleBondElement> Bonds, HashSet<int> SplitNitrogens) Find(SymmetryContext ctx)
    {
        var m = ctx.Molecule;
        var bonds = new List<DoubleBondElement>();
        var split = new HashSet<int>();
        for (var i = 0; i < m.Bonds.Length; i++)
        {
            var b = m.Bonds[i];
            if (b.Order != 1 || ctx.Rings.BondInRing[i] || ctx.Aromaticity.AromaticBonds[i])
            {
                continue;
            }

            var (c, n) = m.Atoms[b.Begin].AtomicNumber == 6 ? (b.Begin, b.End) : (b.End, b.Begin);
            var oxygen = CarbonylPartner(ctx, c);
            if (m.Atoms[n].AtomicNumber != 7 || m.Atoms[n].Charge != 0 || oxygen < 0 || m.Degree(n) + m.Atoms[n].HydrogenCount != 3
                || m.BondOrderSum(n) != m.Degree(n))
            {
                continue;
            }

            if (m.Atoms[n].HydrogenCount == 2)
            {
                split.Add(n);
            }
            else if (m.Atoms[n].HydrogenCount == 0)
            {
                bonds.Add(new DoubleBondElement(c, n, oxygen, FirstOther(ctx, n, c), 0, true, Stereogenic: false));
            }
        }

        return (bonds, split);
    }

    private static int CarbonylPartner(SymmetryContext ctx, int c)
    {
        var m = ctx.Molecule;
        if (m.Atoms[c].AtomicNumber != 6 || ctx.Aromaticity.AromaticAtoms[c])
        {
            return -1;
        }

        var n = m.Neighbours(c);
        var bonds = m.BondsOf(c);
        for (var k = 0; k < n.Length; k++)
        {
            if (m.Bonds[bonds[k]].Order == 2 && m.Atoms[n[k]].AtomicNumber is 8 or 16 && m.Degree(n[k]) == 1)
            {
                return n[k];
            }
        }

        return -1;
    }

    private static int FirstOther(SymmetryContext ctx, int atom, int across)
    {
        foreach (var x in ctx.Molecule.Neighbours(atom))
        {
            if (x != across)
            {
                return x;
            }
        }

        return -1;
    }
}
