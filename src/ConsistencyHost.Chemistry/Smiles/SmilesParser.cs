using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>First pass of the SMILES reader: atoms, bonds, branches and ring closures as written (OpenSMILES grammar).</summary>
internal sealed class SmilesParser
{
    private readonly string text;
    private readonly List<ReadProblem> problems;
    private readonly Stack<(int Atom, int Offset)> branches = new();
    private readonly Dictionary<int, (int Atom, BondSymbol Bond, int Slot, int Offset)> rings = [];
    private int previous = -1;
    private BondSymbol pending = BondSymbol.Implicit;

    public SmilesParser(string text, List<ReadProblem> problems)
    {
        this.text = text;
        this.problems = problems;
    }

    public List<ParsedAtom> Atoms { get; } = [];

    public List<(int Begin, int End, BondSymbol Symbol)> Bonds { get; } = [];

    public void Run(int start, int end)
    {
        var i = start;
        while (i < end)
        {
            i = Step(i, end);
        }

        Finish(end);
    }

    private int Step(int i, int end)
    {
        var c = text[i];
        switch (c)
        {
            case '[':
                var (atom, next) = BracketAtomParser.Parse(text, i, problems);
                if (atom is not null)
                {
                    AddAtom(atom);
                }

                return Math.Min(next, end);
            case '(':
                OpenBranch(i);
                return i + 1;
            case ')':
                CloseBranch(i);
                return i + 1;
            case '.':
                Dot(i);
                return i + 1;
            case '%':
                return RingPercent(i, end);
            case '-' or '=' or '#' or '$' or ':' or '/' or '\\':
                Bond(c, i);
                return i + 1;
            case >= '0' and <= '9':
                Ring(c - '0', i);
                return i + 1;
            default:
                return OrganicAtom(i, end);
        }
    }

    private int OrganicAtom(int i, int end)
    {
        var c = text[i];
        var (z, aromatic, length) = c switch
        {
            'C' when i + 1 < end && text[i + 1] == 'l' => (17, false, 2),
            'B' when i + 1 < end && text[i + 1] == 'r' => (35, false, 2),
            'B' => (5, false, 1),
            'C' => (6, false, 1),
            'N' => (7, false, 1),
            'O' => (8, false, 1),
            'P' => (15, false, 1),
            'S' => (16, false, 1),
            'F' => (9, false, 1),
            'I' => (53, false, 1),
            'b' => (5, true, 1),
            'c' => (6, true, 1),
            'n' => (7, true, 1),
            'o' => (8, true, 1),
            'p' => (15, true, 1),
            's' => (16, true, 1),
            '*' => (0, false, 1),
            _ => (-1, false, 1),
        };
        if (z < 0)
        {
            var message = char.IsAsciiLetter(c) ? SmilesMessages.UnknownElement : SmilesMessages.UnexpectedCharacter;
            problems.Add(Error(SmilesMessages.Format(message, c), i));
            return i + 1;
        }

        AddAtom(new ParsedAtom { AtomicNumber = z, Aromatic = aromatic, Offset = i });
        return i + length;
    }

    private void AddAtom(ParsedAtom atom)
    {
        var index = Atoms.Count;
        Atoms.Add(atom);
        if (previous >= 0)
        {
            Connect(previous, index, pending);
            atom.HasPrevious = true;
        }
        else if (!pending.IsImplicit)
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.BondWithoutAtom, pending.Symbol), pending.Offset));
        }

        if (atom.Bracket && atom.BracketHydrogens > 0)
        {
            atom.Order.Add(TetrahedralStereo.ImplicitHydrogen);
        }

        pending = BondSymbol.Implicit;
        previous = index;
    }

    private void Connect(int a, int b, BondSymbol symbol)
    {
        Bonds.Add((a, b, symbol));
        Atoms[a].Order.Add(b);
        Atoms[b].Order.Add(a);
    }

    private void Bond(char c, int i)
    {
        if (previous < 0)
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.BondWithoutAtom, c), i));
        }

        pending = new BondSymbol(c, i);
    }

    private void OpenBranch(int i)
    {
        if (previous < 0)
        {
            problems.Add(Error(SmilesMessages.BranchWithoutAtom, i));
            return;
        }

        if (i + 1 < text.Length && text[i + 1] == ')')
        {
            problems.Add(Error(SmilesMessages.EmptyBranch, i));
        }

        // OpenSMILES: a branch holds a chain, and a chain starts with an atom (after an optional bond or dot), so
        // "((" is never a nested branch; read leniently, C(((((C))))) would silently become ethane.
        if (i > 0 && text[i - 1] == '(')
        {
            problems.Add(Error(SmilesMessages.BranchOpensBranch, i));
        }

        // A bond belongs to the atom after it, inside the branch ("C(=O)"), never before '(' ("C=(O)").
        if (!pending.IsImplicit)
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.BondBeforeBranch, pending.Symbol), pending.Offset));
            pending = BondSymbol.Implicit;
        }

        branches.Push((previous, i));
    }

    private void CloseBranch(int i)
    {
        if (!pending.IsImplicit)
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.DanglingBond, pending.Symbol), pending.Offset));
            pending = BondSymbol.Implicit;
        }

        if (branches.Count == 0)
        {
            problems.Add(Error(SmilesMessages.UnmatchedCloseBranch, i));
            return;
        }

        previous = branches.Pop().Atom;
    }

    private void Dot(int i)
    {
        if (!pending.IsImplicit)
        {
            problems.Add(Error(SmilesMessages.BondBeforeDot, i));
            pending = BondSymbol.Implicit;
        }

        previous = -1;
    }

    private int RingPercent(int i, int end)
    {
        if (i + 2 < end && char.IsAsciiDigit(text[i + 1]) && char.IsAsciiDigit(text[i + 2]))
        {
            Ring(((text[i + 1] - '0') * 10) + (text[i + 2] - '0'), i);
            return i + 3;
        }

        problems.Add(Error(SmilesMessages.Format(SmilesMessages.UnexpectedCharacter, '%'), i));
        return i + 1;
    }

    private void Ring(int number, int i)
    {
        if (previous < 0)
        {
            problems.Add(Error(SmilesMessages.RingWithoutAtom, i));
            return;
        }

        if (!rings.Remove(number, out var open))
        {
            rings[number] = (previous, pending, Atoms[previous].Order.Count, i);
            Atoms[previous].Order.Add(-2 - number);
            pending = BondSymbol.Implicit;
            return;
        }

        CloseRing(number, open, i);
    }

    private void CloseRing(int number, (int Atom, BondSymbol Bond, int Slot, int Offset) open, int i)
    {
        var bond = pending;
        pending = BondSymbol.Implicit;
        if (!open.Bond.IsImplicit && !bond.IsImplicit && open.Bond.Symbol != bond.Symbol
            && !(IsDirectional(open.Bond.Symbol) && IsDirectional(bond.Symbol)))
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.RingBondConflict, number), i));
        }

        if (open.Atom == previous)
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.RingToSelf, number), i));
            return;
        }

        if (Bonds.Exists(b => (b.Begin == open.Atom && b.End == previous) || (b.Begin == previous && b.End == open.Atom)))
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.DuplicateBond, number), i));
            return;
        }

        // A mark written at the opening digit reads from the opening atom; one at the closing digit from the closing atom.
        if (bond.IsImplicit)
        {
            Bonds.Add((open.Atom, previous, open.Bond));
        }
        else
        {
            Bonds.Add((previous, open.Atom, bond));
        }

        Atoms[open.Atom].Order[open.Slot] = previous;
        Atoms[previous].Order.Add(open.Atom);
    }

    private void Finish(int end)
    {
        if (!pending.IsImplicit)
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.DanglingBond, pending.Symbol), pending.Offset));
        }

        foreach (var (_, offset) in branches)
        {
            problems.Add(Error(SmilesMessages.UnclosedBranch, offset));
        }

        foreach (var (number, open) in rings.OrderBy(r => r.Value.Offset))
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.UnclosedRing, number), open.Offset));
        }

        if (Atoms.Count == 0 && problems.Count == 0)
        {
            problems.Add(Error(SmilesMessages.EmptyInput, end));
        }
    }

    private static bool IsDirectional(char c) => c is '/' or '\\';

    private static ReadProblem Error(string message, int offset) => new(ProblemSeverity.Error, message, offset);
}
