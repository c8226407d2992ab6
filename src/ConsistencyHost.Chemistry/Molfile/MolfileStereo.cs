using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>Stereo from a 2D drawing: wedge/hash → tetrahedral winding; coordinates → double-bond cis/trans.</summary>
/// <remarks>A wedge raises the far atom above the plane, a hash lowers it (narrow end = stereocentre, CTfile
/// convention). The winding is the sign of the signed volume of the neighbour tetrahedron: with four
/// neighbours p0..p3, '@' (anticlockwise seen from p0) ⇔ det[p1−p0, p2−p0, p3−p0] &lt; 0; with three and an
/// implicit H last, '@' ⇔ det[p0−c, p1−c, p2−c] &gt; 0 (the centre lies on the same side of the plane p0p1p2 as
/// the hydrogen).</remarks>
internal static class MolfileStereo
{
    public static Molecule Add(Molecule m, MolfileTable table, List<ReadProblem> problems)
    {
        var builder = Copy(m);
        var centres = new SortedSet<int>();
        foreach (var b in m.Bonds)
        {
            if (b.Mark is BondStereoMark.Wedge or BondStereoMark.Hash)
            {
                centres.Add(b.Begin);
            }
        }

        foreach (var c in centres)
        {
            if (Tetrahedral(m, table, c) is { } t)
            {
                builder.AddTetrahedral(t);
            }
            else
            {
                problems.Add(new ReadProblem(ProblemSeverity.Warning, MolfileMessages.Format(MolfileMessages.AmbiguousWedge, c + 1), Line: table.Atoms[c].Line, AtomIndex: c));
            }
        }

        for (var i = 0; i < m.Bonds.Length; i++)
        {
            if (DoubleBond(m, table, i) is { } d)
            {
                builder.AddDoubleBond(d);
            }
        }

        return builder.Build();
    }

    private static TetrahedralStereo? Tetrahedral(Molecule m, MolfileTable table, int c)
    {
        var n = m.Neighbours(c);
        var bonds = m.BondsOf(c);
        if (n.Length is < 3 or > 4)
        {
            return null;
        }

        var p = new (double X, double Y, double Z)[n.Length];
        for (var k = 0; k < n.Length; k++)
        {
            var b = m.Bonds[bonds[k]];
            var a = table.Atoms[n[k]];
            var length = Math.Sqrt(Sq(a.X - table.Atoms[c].X) + Sq(a.Y - table.Atoms[c].Y));
            var z = b.Begin != c ? 0 : b.Mark == BondStereoMark.Wedge ? length : b.Mark == BondStereoMark.Hash ? -length : 0;
            p[k] = (a.X, a.Y, z);
        }

        var centre = (table.Atoms[c].X, table.Atoms[c].Y, 0.0);
        var volume = n.Length == 4 ? -Det(Sub(p[1], p[0]), Sub(p[2], p[0]), Sub(p[3], p[0])) : Det(Sub(p[0], centre), Sub(p[1], centre), Sub(p[2], centre));
        if (Math.Abs(volume) < 1e-6)
        {
            return null;
        }

        int[] slots = n.Length == 4 ? [n[0], n[1], n[2], n[3]] : [n[0], n[1], n[2], TetrahedralStereo.ImplicitHydrogen];
        return new TetrahedralStereo(c, [.. slots], volume > 0 ? TetrahedralWinding.Anticlockwise : TetrahedralWinding.Clockwise);
    }

    private static DoubleBondStereo? DoubleBond(Molecule m, MolfileTable table, int bond)
    {
        var b = m.Bonds[bond];
        if (b.Order != 2 || b.Mark == BondStereoMark.Either || b.IsAromatic || HasEitherNeighbour(m, b))
        {
            return null;
        }

        var ra = FirstOther(m, b.Begin, b.End);
        var rb = FirstOther(m, b.End, b.Begin);
        if (ra < 0 || rb < 0)
        {
            return null;
        }

        var a = table.Atoms[b.Begin];
        var e = table.Atoms[b.End];
        var sa = Cross(e.X - a.X, e.Y - a.Y, table.Atoms[ra].X - a.X, table.Atoms[ra].Y - a.Y);
        var sb = Cross(e.X - a.X, e.Y - a.Y, table.Atoms[rb].X - a.X, table.Atoms[rb].Y - a.Y);
        // Finite but huge coordinates can overflow to NaN, which has no side (and Math.Sign throws on it).
        if (!(Math.Abs(sa) >= 1e-4) || !(Math.Abs(sb) >= 1e-4))
        {
            return null;
        }

        return new DoubleBondStereo(bond, ra, rb, Math.Sign(sa) == Math.Sign(sb) ? DoubleBondConfiguration.Cis : DoubleBondConfiguration.Trans);
    }

    private static bool HasEitherNeighbour(Molecule m, Bond b)
    {
        foreach (var end in (ReadOnlySpan<int>)[b.Begin, b.End])
        {
            foreach (var x in m.BondsOf(end))
            {
                if (m.Bonds[x].Mark == BondStereoMark.Either)
                {
                    return true;
                }
            }
        }

        return false;
    }

    private static int FirstOther(Molecule m, int atom, int across)
    {
        foreach (var x in m.Neighbours(atom))
        {
            if (x != across)
            {
                return x;
            }
        }

        return -1;
    }

    private static double Sq(double v) => v * v;

    private static double Cross(double ax, double ay, double bx, double by) => (ax * by) - (ay * bx);

    private static (double, double, double) Sub((double X, double Y, double Z) a, (double X, double Y, double Z) b) => (a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    private static double Det((double X, double Y, double Z) a, (double X, double Y, double Z) b, (double X, double Y, double Z) c) =>
        (a.X * ((b.Y * c.Z) - (b.Z * c.Y))) - (a.Y * ((b.X * c.Z) - (b.Z * c.X))) + (a.Z * ((b.X * c.Y) - (b.Y * c.X)));

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

        return builder;
    }
}
