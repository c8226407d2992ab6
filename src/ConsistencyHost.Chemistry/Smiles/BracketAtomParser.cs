using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Reads one bracket atom: [isotope? symbol chirality? hcount? charge? class?].</summary>
internal static class BracketAtomParser
{
    private static readonly string[] AromaticSymbols = ["se", "as", "te", "b", "c", "n", "o", "p", "s"];

    /// <summary>Parses from text[start] == '['; returns the atom and the index after ']', or null with problems.</summary>
    public static (ParsedAtom? Atom, int Next) Parse(string text, int start, List<ReadProblem> problems)
    {
        var close = text.IndexOf(']', start);
        if (close < 0)
        {
            problems.Add(Error(SmilesMessages.UnclosedBracket, start));
            return (null, text.Length);
        }

        var i = start + 1;
        var isotope = ReadNumber(text, ref i, close);
        var (z, aromatic, symbolLength) = ReadSymbol(text, i, close);
        if (z < 0)
        {
            var bad = i < close ? text.Substring(i, Math.Min(2, close - i)) : "]";
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.UnknownElement, bad), i));
            return (null, close + 1);
        }

        i += symbolLength;
        var chirality = ReadChirality(text, ref i, close, problems);
        var hydrogens = 0;
        if (i < close && text[i] == 'H')
        {
            i++;
            var n = ReadNumber(text, ref i, close);
            hydrogens = n < 0 ? 1 : n;
        }

        var charge = ReadCharge(text, ref i, close);
        var atomClass = 0;
        if (i < close && text[i] == ':')
        {
            i++;
            atomClass = Math.Max(0, ReadNumber(text, ref i, close));
        }

        if (i != close)
        {
            problems.Add(Error(SmilesMessages.Format(SmilesMessages.BadBracketContent, text[i]), i));
            return (null, close + 1);
        }

        var atom = new ParsedAtom
        {
            AtomicNumber = z, Aromatic = aromatic, Bracket = true, BracketHydrogens = hydrogens,
            Charge = charge, Isotope = Math.Max(0, isotope), AtomClass = atomClass, Chirality = chirality,
            Offset = start,
        };
        return (atom, close + 1);
    }

    private static (int Z, bool Aromatic, int Length) ReadSymbol(string text, int i, int end)
    {
        if (i >= end)
        {
            return (-1, false, 0);
        }

        if (text[i] == '*')
        {
            return (0, false, 1);
        }

        foreach (var s in AromaticSymbols)
        {
            if (string.CompareOrdinal(text, i, s, 0, s.Length) == 0 && i + s.Length <= end)
            {
                var e = Elements.FromSymbol(char.ToUpperInvariant(s[0]) + s[1..]);
                return (e!.AtomicNumber, true, s.Length);
            }
        }

        if (!char.IsAsciiLetterUpper(text[i]))
        {
            return (-1, false, 0);
        }

        if (i + 1 < end && char.IsAsciiLetterLower(text[i + 1]) && Elements.FromSymbol(text.Substring(i, 2)) is { } two)
        {
            return (two.AtomicNumber, false, 2);
        }

        var one = Elements.FromSymbol(text.Substring(i, 1));
        return one is null ? (-1, false, 0) : (one.AtomicNumber, false, 1);
    }

    private static int ReadChirality(string text, ref int i, int end, List<ReadProblem> problems)
    {
        if (i >= end || text[i] != '@')
        {
            return 0;
        }

        var at = i;
        i++;
        var chirality = 1;
        if (i < end && text[i] == '@')
        {
            i++;
            chirality = 2;
        }
        else if (i + 2 < end && text[i] == 'T' && text[i + 1] == 'H' && (text[i + 2] == '1' || text[i + 2] == '2'))
        {
            chirality = text[i + 2] == '1' ? 1 : 2;
            i += 3;
        }
        else if (i < end && char.IsAsciiLetterUpper(text[i]) && text[i] != 'H')
        {
            var j = i;
            while (j < end && (char.IsAsciiLetterUpper(text[j]) || char.IsAsciiDigit(text[j])))
            {
                j++;
            }

            problems.Add(new ReadProblem(ProblemSeverity.Warning,
                SmilesMessages.Format(SmilesMessages.ChiralityClassUnsupported, text[at..j]), at));
            i = j;
            return 0;
        }

        return chirality;
    }

    private static int ReadCharge(string text, ref int i, int end)
    {
        if (i >= end || (text[i] != '+' && text[i] != '-'))
        {
            return 0;
        }

        var sign = text[i] == '+' ? 1 : -1;
        var symbol = text[i];
        i++;
        var n = ReadNumber(text, ref i, end);
        if (n >= 0)
        {
            return sign * n;
        }

        var count = 1;
        while (i < end && text[i] == symbol)
        {
            count++;
            i++;
        }

        return sign * count;
    }

    private static int ReadNumber(string text, ref int i, int end)
    {
        var value = -1;
        while (i < end && char.IsAsciiDigit(text[i]) && value < 100_000)
        {
            value = (Math.Max(value, 0) * 10) + (text[i] - '0');
            i++;
        }

        return value;
    }

    private static ReadProblem Error(string message, int offset) => new(ProblemSeverity.Error, message, offset);
}
