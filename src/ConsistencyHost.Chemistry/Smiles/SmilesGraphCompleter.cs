using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Second pass: bond orders, kekulisation, implicit hydrogens and stereo descriptors.</summary>
internal sealed class SmilesGraphCompleter
{
    private readonly SmilesParser parsed;
    private readonly List<ReadProblem> problems;
    private readonly SmilesReadOptions options;
    private readonly int[] order;
    private readonly bool[] aromaticBond;

    public SmilesGraphCompleter(SmilesParser parsed, List<ReadProblem> problems, SmilesReadOptions options)
    {
        this.parsed = parsed;
        this.problems = problems;
        this.options = options;
        order = new int[parsed.Bonds.Count];
        aromaticBond = new bool[parsed.Bonds.Count];
    }

    public Molecule Complete()
    {
        AssignWrittenOrders();
        Kekulise();
        var builder = new MoleculeBuilder();
        for (var i = 0; i < parsed.Atoms.Count; i++)
        {
            var a = parsed.Atoms[i];
            builder.AddAtom(new Atom(a.AtomicNumber, a.Charge, a.Isotope, Hydrogens(i), a.Aromatic, a.AtomClass, 0));
        }

        for (var i = 0; i < parsed.Bonds.Count; i++)
        {
            var (b, e, symbol) = parsed.Bonds[i];
            var mark = symbol.Symbol switch { '/' => BondStereoMark.Up, '\\' => BondStereoMark.Down, _ => BondStereoMark.None };
            builder.AddBond(new Bond(b, e, order[i], aromaticBond[i], mark));
        }

        AddTetrahedral(builder);
        var molecule = builder.Build();
        return SmilesDoubleBondStereo.Add(molecule, problems, [.. parsed.Atoms.Select(a => a.Offset)]);
    }

    private void AssignWrittenOrders()
    {
        for (var i = 0; i < parsed.Bonds.Count; i++)
        {
            var (b, e, symbol) = parsed.Bonds[i];
            aromaticBond[i] = symbol.Symbol == ':' ||
                (symbol.IsImplicit && parsed.Atoms[b].Aromatic && parsed.Atoms[e].Aromatic);
            order[i] = symbol.Order;
        }
    }

    private void Kekulise()
    {
        var n = parsed.Atoms.Count;
        var sigma = new int[n];
        var aromaticList = new List<(int, int, int)>();
        for (var i = 0; i < parsed.Bonds.Count; i++)
        {
            var (b, e, _) = parsed.Bonds[i];
            sigma[b] += order[i];
            sigma[e] += order[i];
            if (aromaticBond[i])
            {
                aromaticList.Add((b, e, i));
            }
        }

        var needs = new bool[n];
        for (var i = 0; i < n; i++)
        {
            var a = parsed.Atoms[i];
            needs[i] = a.Aromatic && ValenceModel.NeedsPiBond(a.AtomicNumber, a.Charge, sigma[i], a.Bracket ? a.BracketHydrogens : 0);
        }

        var (doubles, failed) = Kekulizer.Solve(n, needs, aromaticList);
        if (failed >= 0)
        {
            var a = parsed.Atoms[failed];
            var message = SmilesMessages.Format(SmilesMessages.KekuliseFailed, failed, Elements.SymbolOf(a.AtomicNumber));
            problems.Add(new ReadProblem(options.Strict ? ProblemSeverity.Error : ProblemSeverity.Warning, message, a.Offset, AtomIndex: failed));
        }

        foreach (var bond in doubles)
        {
            order[bond] = 2;
        }
    }

    private int Hydrogens(int index)
    {
        var a = parsed.Atoms[index];
        var sum = 0;
        for (var i = 0; i < parsed.Bonds.Count; i++)
        {
            var (b, e, _) = parsed.Bonds[i];
            sum += b == index || e == index ? order[i] : 0;
        }

        if (a.Bracket)
        {
            CheckValence(index, a, sum + a.BracketHydrogens, a.Charge);
            return a.BracketHydrogens;
        }

        var h = ValenceModel.ImplicitHydrogens(a.AtomicNumber, 0, sum);
        if (h < 0)
        {
            CheckValence(index, a, sum, 0);
            return 0;
        }

        return h;
    }

    /// <summary>Second-row atoms cannot expand their octet; heavier ones may (hypervalent S, P, halogens).</summary>
    private void CheckValence(int index, ParsedAtom a, int used, int charge)
    {
        var max = ValenceModel.MaxValence(a.AtomicNumber, charge);
        if (a.AtomicNumber is >= 5 and <= 9 && used > max)
        {
            var message = SmilesMessages.Format(SmilesMessages.BadValence, index, Elements.SymbolOf(a.AtomicNumber), used, max);
            problems.Add(new ReadProblem(options.Strict ? ProblemSeverity.Error : ProblemSeverity.Warning, message, a.Offset, AtomIndex: index));
        }
    }

    private void AddTetrahedral(MoleculeBuilder builder)
    {
        for (var i = 0; i < parsed.Atoms.Count; i++)
        {
            var a = parsed.Atoms[i];
            if (a.Chirality == 0)
            {
                continue;
            }

            var neighbours = new List<int>(a.Order);
            if (neighbours.Count == 3 && a.BracketHydrogens == 0)
            {
                neighbours.Insert(a.HasPrevious ? 1 : 0, TetrahedralStereo.ImplicitHydrogen);
            }

            if (neighbours.Count != 4 || a.BracketHydrogens > 1 || neighbours.Exists(x => x < -1))
            {
                problems.Add(new ReadProblem(ProblemSeverity.Warning,
                    SmilesMessages.Format(SmilesMessages.ChiralityIgnored, i, a.Order.Count(x => x >= 0) + a.BracketHydrogens), a.Offset, AtomIndex: i));
                continue;
            }

            var winding = a.Chirality == 1 ? TetrahedralWinding.Anticlockwise : TetrahedralWinding.Clockwise;
            builder.AddTetrahedral(new TetrahedralStereo(i, [.. neighbours], winding));
        }
    }
}
