using System.Globalization;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Formula;

/// <summary>Parses a flat elemental formula with an optional trailing charge ("C2H7N+", "C6H5O7-3", "SO4 2-").</summary>
internal static class FormulaParser
{
    public static (MolecularFormula? Formula, string? Error) Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var s = text.Replace(" ", string.Empty, StringComparison.Ordinal);
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        var i = 0;
        while (i < s.Length && char.IsAsciiLetterUpper(s[i]))
        {
            var start = i++;
            while (i < s.Length && char.IsAsciiLetterLower(s[i]))
            {
                i++;
            }

            var symbol = s[start..i];
            if (Elements.FromSymbol(symbol) is null || symbol == "*")
            {
                return (null, string.Create(CultureInfo.InvariantCulture, $"Unknown element '{symbol}' at position {start} of formula '{text}'."));
            }

            var n = Number(s, ref i);
            counts[symbol] = counts.GetValueOrDefault(symbol) + (n < 0 ? 1 : n);
        }

        var (charge, ok) = Charge(s, ref i);
        if (!ok || i != s.Length || counts.Count == 0)
        {
            return (null, string.Create(CultureInfo.InvariantCulture,
                $"Unexpected '{(i < s.Length ? s[i..] : "end")}' at position {i} of formula '{text}'; expected an element symbol, a count or a charge such as '+', '2-' or '-2'."));
        }

        return (FormulaCalculator.FromCounts(counts, charge), null);
    }

    private static (int Charge, bool Ok) Charge(string s, ref int i)
    {
        if (i >= s.Length)
        {
            return (0, true);
        }

        var leading = Number(s, ref i);
        if (i >= s.Length || (s[i] != '+' && s[i] != '-'))
        {
            return (0, false);
        }

        var sign = s[i++] == '+' ? 1 : -1;
        var trailing = Number(s, ref i);
        if (leading >= 0 && trailing >= 0)
        {
            return (0, false);
        }

        return (sign * Math.Max(1, Math.Max(leading, trailing)), true);
    }

    private static int Number(string s, ref int i)
    {
        var value = -1;
        while (i < s.Length && char.IsAsciiDigit(s[i]) && value < 1_000_000)
        {
            value = (Math.Max(value, 0) * 10) + (s[i] - '0');
            i++;
        }

        return value;
    }
}
