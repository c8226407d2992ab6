using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Reading;

/// <summary>Folds plain explicit hydrogen atoms into their heavy atom's hydrogen count, keeping stereo meaning.</summary>
/// <remarks>A hydrogen is folded when it is ordinary 1H (no isotope), uncharged, and singly bonded to exactly
/// one non-hydrogen atom. Isotopic hydrogens ([2H]) and H2 stay atoms. Remaining atoms are renumbered densely in
/// input order. A folded H in a tetrahedral neighbour list becomes <see cref="TetrahedralStereo.ImplicitHydrogen"/>;
/// a folded H used as a double-bond reference is replaced by the other substituent with the configuration flipped.</remarks>
internal static class HydrogenFolder
{
    public static (Molecule Molecule, int[] NewIndex) Fold(Molecule m)
    {
        var fold = FoldableHydrogens(m);
        var newIndex = new int[m.AtomCount];
        var builder = new MoleculeBuilder();
        for (var i = 0; i < m.AtomCount; i++)
        {
            newIndex[i] = fold[i] ? -1 : builder.AddAtom(m.Atoms[i] with { HydrogenCount = m.Atoms[i].HydrogenCount + CountFolded(m, fold, i) });
        }

        foreach (var b in m.Bonds)
        {
            if (newIndex[b.Begin] >= 0 && newIndex[b.End] >= 0)
            {
                builder.AddBond(b with { Begin = newIndex[b.Begin], End = newIndex[b.End] });
            }
        }

        foreach (var t in m.TetrahedralStereo)
        {
            builder.AddTetrahedral(t with
            {
                Centre = newIndex[t.Centre],
                Neighbours = [.. t.Neighbours.Select(n => n < 0 ? n : newIndex[n])],
            });
        }

        foreach (var d in m.DoubleBondStereo)
        {
            if (Remap(m, d, fold, newIndex, BondIndexMap(m, newIndex)) is { } mapped)
            {
                builder.AddDoubleBond(mapped);
            }
        }

        return (builder.Build(), newIndex);
    }

    private static bool[] FoldableHydrogens(Molecule m)
    {
        var fold = new bool[m.AtomCount];
        for (var i = 0; i < m.AtomCount; i++)
        {
            var a = m.Atoms[i];
            if (a.AtomicNumber == 1 && a.Isotope == 0 && a.Charge == 0 && m.Degree(i) == 1)
            {
                var heavy = m.Neighbours(i)[0];
                fold[i] = m.Atoms[heavy].AtomicNumber != 1 && m.Bonds[m.BondsOf(i)[0]].Order == 1;
            }
        }

        return fold;
    }

    private static int CountFolded(Molecule m, bool[] fold, int atom)
    {
        var n = 0;
        foreach (var x in m.Neighbours(atom))
        {
            n += fold[x] ? 1 : 0;
        }

        return n;
    }

    private static int[] BondIndexMap(Molecule m, int[] newIndex)
    {
        var map = new int[m.Bonds.Length];
        var next = 0;
        for (var i = 0; i < m.Bonds.Length; i++)
        {
            map[i] = newIndex[m.Bonds[i].Begin] >= 0 && newIndex[m.Bonds[i].End] >= 0 ? next++ : -1;
        }

        return map;
    }

    private static DoubleBondStereo? Remap(Molecule m, DoubleBondStereo d, bool[] fold, int[] newIndex, int[] bondMap)
    {
        var bond = m.Bonds[d.Bond];
        var (begin, flipBegin) = Substitute(m, bond.Begin, bond.End, d.BeginReference, fold);
        var (end, flipEnd) = Substitute(m, bond.End, bond.Begin, d.EndReference, fold);
        if (begin < 0 || end < 0)
        {
            return null;
        }

        var config = flipBegin ^ flipEnd
            ? (d.Configuration == DoubleBondConfiguration.Cis ? DoubleBondConfiguration.Trans : DoubleBondConfiguration.Cis)
            : d.Configuration;
        return new DoubleBondStereo(bondMap[d.Bond], newIndex[begin], newIndex[end], config);
    }

    private static (int Atom, bool Flipped) Substitute(Molecule m, int atom, int across, int reference, bool[] fold)
    {
        if (!fold[reference])
        {
            return (reference, false);
        }

        foreach (var x in m.Neighbours(atom))
        {
            if (x != across && x != reference && !fold[x])
            {
                return (x, true);
            }
        }

        return (-1, false);
    }
}
