using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Reads coupling items: "J = 7.1 Hz", "J 8.2", "J = 8.0 and 2.0 Hz", "J1 = 8.0", "J(H,F) = 8.9 Hz", "JHF = 47",
/// "2JHF = 47.5 Hz", "³J = 7", "J = 7.1 Hz (H-F)", "1JC–F = 245 Hz", "JC-F", "2JC,F", and bare continuations "2.0 Hz" / "6.7".
/// </summary>
internal static class CouplingReader
{
    /// <summary>True when the item starts like a J item ("J", "3J", "²J", "JHF").</summary>
    public static bool LooksLikeJ(string text)
    {
        var i = 0;
        if (i < text.Length && (char.IsAsciiDigit(text[i]) || text[i] is '¹' or '²' or '³' or '⁴' or '⁵')) i++;
        if (i >= text.Length || text[i] != 'J') return false;
        var next = i + 1 < text.Length ? text[i + 1] : ' ';
        return !char.IsAsciiLetterLower(next) || next is 'a' or 'b';
    }

    /// <summary>Reads a J item into <paramref name="into"/>; problems go to the sink.</summary>
    public static void ReadJ(DetailItem item, Nucleus observed, bool decimalComma, ProblemSink sink, List<Coupling> into)
    {
        var c = new TextCursor(item.Text);
        int? bonds = null;
        if (char.IsAsciiDigit(c.Current) || c.Current is '¹' or '²' or '³' or '⁴' or '⁵')
        {
            bonds = c.Current switch { '¹' => 1, '²' => 2, '³' => 3, '⁴' => 4, '⁵' => 5, _ => c.Current - '0' };
            c.Pos++;
        }
        c.Pos++; // the J itself
        var partner = ReadLabelPair(c);
        var pair = partner is null ? ReadTypeOrIndex(c) : null;
        var start = into.Count;
        ReadValues(c, item, observed, decimalComma, sink, into, pair, bonds);
        if (partner is null) return;
        for (var i = start; i < into.Count; i++) into[i] = into[i] with { PartnerLabel = partner };
    }

    /// <summary>"J(H2,H3)" or "J(H-2,H-3)": two assignment labels, kept as written ("H2,H3") in PartnerLabel.</summary>
    private static string? ReadLabelPair(TextCursor c)
    {
        if (c.Current != '(') return null;
        var close = c.MatchingParen(c.Pos);
        if (close < 0) return null;
        var inner = c.Text[(c.Pos + 1)..close];
        if (!inner.Contains(',') || ReadPair(inner) is not null) return null;
        c.Pos = close + 1;
        return string.Join(",", inner.Split(',').Select(p => p.Trim()));
    }

    /// <summary>Reads a bare continuation: "2.0 Hz", "6.7", "8.0 and 2.0 Hz".</summary>
    public static void ReadBare(DetailItem item, Nucleus observed, bool decimalComma, ProblemSink sink, List<Coupling> into) =>
        ReadValues(new TextCursor(item.Text), item, observed, decimalComma, sink, into, null, null);

    /// <summary>Reads "(H,F)", "(H-F)", "HF", "_HF", "_AB", "AB", "1", "₁" after the J; returns the nucleus pair.</summary>
    private static string? ReadTypeOrIndex(TextCursor c)
    {
        c.TryChar('_');
        if (c.Current == '(' && c.Text.IndexOf(')', c.Pos) is var close and > 0 && ReadPair(c.Text[(c.Pos + 1)..close]) is { } typed)
        {
            c.Pos = close + 1;
            return typed;
        }
        if (IsNucleusLetter(c.Current) && IsNucleusLetter(c.PeekAt(1)))
        {
            var pair = $"{c.Current}{c.PeekAt(1)}";
            c.Pos += 2;
            return pair;
        }
        // "JC–F", "JC-F", "JC,F", "1JC−F" (common practice in 13C lists of fluorinated compounds).
        if (IsNucleusLetter(c.Current) && IsPairSeparator(c.PeekAt(1)) && IsNucleusLetter(c.PeekAt(2)))
        {
            var pair = $"{c.Current}{c.PeekAt(2)}";
            c.Pos += 3;
            return pair;
        }
        while (char.IsAsciiDigit(c.Current) || c.Current is >= '₀' and <= '₉' or 'A' or 'B' or 'a' or 'b' or 'X') c.Pos++;
        return null;
    }

    private static bool IsNucleusLetter(char ch) => ch is 'H' or 'F' or 'P' or 'C' or 'D';

    private static bool IsPairSeparator(char ch) => ch is ',' or '-' or '–' or '−' or '‒';

    /// <summary>"H,F", "H-F", "HF", "H, F" → "HF"; null when not a pair of nucleus letters.</summary>
    private static string? ReadPair(string inner)
    {
        var letters = inner.Where(ch => ch != ' ' && !IsPairSeparator(ch)).ToArray();
        return letters.Length == 2 && IsNucleusLetter(letters[0]) && IsNucleusLetter(letters[1])
            ? new string(letters) : null;
    }

    private static void ReadValues(TextCursor c, DetailItem item, Nucleus observed, bool decimalComma,
        ProblemSink sink, List<Coupling> into, string? pair, int? bonds)
    {
        c.SkipSpaces();
        // '¼' is '=' as the text layer of many journal PDFs renders it ("J¼8.3 Hz", corpus rows si-003, si-058).
        if (c.Current is '=' or ':' or '≈' or '~' or '¼') c.Pos++;
        // Most items hold one or two values: a stack buffer, and a list only past eight.
        Span<double> buffer = stackalloc double[8];
        List<double>? more = null;
        var count = 0;
        while (true)
        {
            c.SkipSpaces();
            var at = c.Pos;
            if (!c.TryNumber(decimalComma, out var value, out _) || value < 0)
            {
                sink.Add(item.Offset + at, Fragment(item, at), ReportedTextMessages.ExpectedCouplingValue);
                return;
            }
            if (count < buffer.Length) buffer[count] = value;
            else (more ??= []).Add(value);
            count++;
            c.SkipSpaces();
            if (c.TryWord("and") || c.TryChar('&') || c.TryChar('/')) continue;
            // "J = 8.0 Hz and 1.2 Hz": the unit written after each value.
            var beforeUnit = c.Pos;
            if (c.TryWord("Hz"))
            {
                c.SkipSpaces();
                if (c.TryWord("and") || c.TryChar('&')) continue;
            }
            c.Pos = beforeUnit;
            break;
        }
        c.SkipSpaces();
        if (c.TryWord("Hz")) c.SkipSpaces();
        if (c.Current == '(' && c.MatchingParen(c.Pos) is var close and > 0 && ReadPair(c.Text[(c.Pos + 1)..close]) is { } suffix)
        {
            pair = suffix;
            c.Pos = close + 1;
            c.SkipSpaces();
        }
        if (!c.AtEnd)
        {
            sink.Add(item.Offset + c.Pos, Fragment(item, c.Pos), ReportedTextMessages.ExpectedDetail);
            return;
        }
        var partner = PartnerOf(pair, observed);
        foreach (var v in buffer[..Math.Min(count, buffer.Length)]) into.Add(new Coupling(v, null, partner) { BondCount = bonds });
        if (more is null) return;
        foreach (var v in more) into.Add(new Coupling(v, null, partner) { BondCount = bonds });
    }

    /// <summary>The nucleus coupled to the observed one; null for homonuclear (or unstated in 1H/19F/31P).</summary>
    /// <remarks>In a 13C{1H} list an untyped splitting is taken as C–F (Common practice: ACS-style "(d, J = 245.3 Hz)").</remarks>
    private static string? PartnerOf(string? pair, Nucleus observed)
    {
        var own = observed switch { Nucleus.H1 => 'H', Nucleus.C13 => 'C', Nucleus.F19 => 'F', Nucleus.P31 => 'P', _ => '?' };
        if (pair is null) return observed == Nucleus.C13 ? "F" : null;
        var other = pair[0] == own ? pair[1] : pair[1] == own ? pair[0] : pair[1];
        return other == own ? null : other.ToString();
    }

    private static string Fragment(DetailItem item, int pos) =>
        item.Text.Length - pos > 30 ? item.Text.Substring(pos, 30) : item.Text[pos..];
}
