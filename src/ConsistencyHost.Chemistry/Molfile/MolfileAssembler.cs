using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>Turns a connection table into a molecule: Kekulé orders for aromatic bonds, implicit hydrogens by
/// the MDL valence model, stereo from coordinates, then explicit H folded.</summary>
internal static class MolfileAssembler
{
    public static Molecule Build(MolfileTable table, List<ReadProblem> problems)
    {
        var orders = KekuleOrders(table, problems);
        var builder = new MoleculeBuilder();
        var sums = new int[table.Atoms.Count];
        for (var i = 0; i < table.Bonds.Count; i++)
        {
            sums[table.Bonds[i].Begin] += orders[i];
            sums[table.Bonds[i].End] += orders[i];
        }

        for (var i = 0; i < table.Atoms.Count; i++)
        {
            var a = table.Atoms[i];
            builder.AddAtom(new Atom(a.AtomicNumber, a.Charge, a.Isotope, Hydrogens(a, i, sums[i], problems), IsAromatic(table, i), 0, a.Radical));
        }

        for (var i = 0; i < table.Bonds.Count; i++)
        {
            var b = table.Bonds[i];
            var mark = b.Stereo switch { 1 => BondStereoMark.Wedge, 6 => BondStereoMark.Hash, 4 or 3 => BondStereoMark.Either, _ => BondStereoMark.None };
            builder.AddBond(new Bond(b.Begin, b.End, orders[i], b.Type == 4, mark));
        }

        var withH = builder.Build();
        var withStereo = MolfileStereo.Add(withH, table, problems);
        return HydrogenFolder.Fold(withStereo).Molecule;
    }

    private static bool IsAromatic(MolfileTable table, int atom) =>
        table.Bonds.Exists(b => b.Type == 4 && (b.Begin == atom || b.End == atom));

    private static int Hydrogens(MolfileAtom a, int index, int sum, List<ReadProblem> problems)
    {
        var h = ValenceModel.ImplicitHydrogens(a.AtomicNumber, a.Charge, sum, a.Radical);
        if (h >= 0)
        {
            return h;
        }

        if (a.AtomicNumber is >= 5 and <= 9)
        {
            var message = MolfileMessages.Format(MolfileMessages.BadValence, index + 1, a.Symbol, sum, ValenceModel.MaxValence(a.AtomicNumber, a.Charge));
            problems.Add(new ReadProblem(ProblemSeverity.Error, message, Line: a.Line, Column: 32, AtomIndex: index));
        }

        return 0;
    }

    private static int[] KekuleOrders(MolfileTable table, List<ReadProblem> problems)
    {
        var orders = table.Bonds.Select(b => b.Type == 4 ? 1 : b.Type).ToArray();
        var aromatic = new List<(int, int, int)>();
        var sigma = new int[table.Atoms.Count];
        for (var i = 0; i < table.Bonds.Count; i++)
        {
            var b = table.Bonds[i];
            sigma[b.Begin] += orders[i];
            sigma[b.End] += orders[i];
            if (b.Type == 4)
            {
                aromatic.Add((b.Begin, b.End, i));
            }
        }

        if (aromatic.Count == 0)
        {
            return orders;
        }

        var needs = new bool[table.Atoms.Count];
        for (var i = 0; i < needs.Length; i++)
        {
            var a = table.Atoms[i];
            needs[i] = IsAromatic(table, i) && ValenceModel.NeedsPiBond(a.AtomicNumber, a.Charge, sigma[i], 0);
        }

        var (doubles, failed) = Kekulizer.Solve(needs.Length, needs, aromatic);
        if (failed >= 0)
        {
            var a = table.Atoms[failed];
            problems.Add(new ReadProblem(ProblemSeverity.Error, MolfileMessages.Format(MolfileMessages.KekuliseFailed, failed + 1, a.Symbol), Line: a.Line, Column: 32, AtomIndex: failed));
        }

        foreach (var d in doubles)
        {
            orders[d] = 2;
        }

        return orders;
    }
}
