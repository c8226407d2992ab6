using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Reads "HRMS (ESI) m/z: [M + H]+ calcd for C10H14NO2 180.1019; found 180.1016." and its variants
/// ("HRMS (ESI-TOF) m/z [M+Na]+ Calcd for C12H15NO3Na: 244.0944, Found 244.0941", "calc.", "calculated").
/// </summary>
/// <remarks>Form from the ACS-style example quoted in docs/spectra.md (ACS guidelines, paraphrased).</remarks>
internal static class HrmsReader
{
    public static bool IsAt(TextCursor c)
    {
        if (c.Pos > 0 && char.IsLetterOrDigit(c.Text[c.Pos - 1])) return false;
        return StartsWith(c, "HRMS") || StartsWith(c, "HR-MS");
    }

    private static bool StartsWith(TextCursor c, string word) =>
        string.CompareOrdinal(c.Text, c.Pos, word, 0, word.Length) == 0 && !char.IsLetterOrDigit(c.PeekAt(word.Length));

    public static HrmsClaim? Read(TextCursor c, ProblemSink sink)
    {
        var offset = c.Pos;
        c.Pos += c.Text[c.Pos + 2] == '-' ? 5 : 4;
        var ionisation = ReadIonisation(c);
        SkipPunctuation(c);
        if (c.TryWord("m/z", needBoundary: false)) SkipPunctuation(c);
        var ion = ReadIonLabel(c);
        SkipPunctuation(c);
        if (!(c.TryWord("calcd") || c.TryWord("calculated") || c.TryWord("calc")))
            return Fail(c, sink, ReportedTextMessages.ExpectedHrmsCalculated);
        c.TryChar('.');
        c.SkipSpaces();
        if (c.TryWord("for")) c.SkipSpaces();
        var formula = ReadFormula(c);
        if (formula.Length == 0) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsFormula);
        c.SkipSpaces();
        ion ??= ReadIonLabel(c);
        SkipPunctuation(c);
        if (!c.TryNumber(false, out var calcd, out var calcdDecimals)) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsMz);
        var (found, foundDecimals, ok) = ReadFound(c, sink);
        return ok ? new HrmsClaim(ionisation, ion, formula, calcd, found, calcdDecimals, foundDecimals, offset) : null;
    }

    private static (double? Found, int Decimals, bool Ok) ReadFound(TextCursor c, ProblemSink sink)
    {
        var end = c.Pos;
        c.SkipSpaces();
        if (c.Current is ';' or ',') c.Pos++;
        c.SkipSpaces();
        if (!c.TryWord("found"))
        {
            c.Pos = end;
            if (c.Current == '.') c.Pos++;
            var probe = new TextCursor(c.Text) { Pos = c.Pos };
            probe.SkipSpaces();
            if (probe.AtEnd || HeaderReader.IsAt(probe) || IsAt(probe)) return (null, 0, true);
            Fail(probe, sink, ReportedTextMessages.ExpectedHrmsFound);
            c.Pos = probe.Pos;
            return (null, 0, false);
        }
        SkipPunctuation(c);
        if (!c.TryNumber(false, out var found, out var decimals))
        {
            Fail(c, sink, ReportedTextMessages.ExpectedHrmsMz);
            return (null, 0, false);
        }
        if (c.Current == '.' && !TextCursor.IsDigit(c.PeekAt(1))) c.Pos++;
        return (found, decimals, true);
    }

    private static string? ReadIonisation(TextCursor c)
    {
        c.SkipSpaces();
        if (c.Current != '(') return null;
        var close = c.MatchingParen(c.Pos);
        if (close < 0) return null;
        var text = c.Text[(c.Pos + 1)..close].Trim();
        if (LooksLikeIon(text)) return null; // "HRMS (M+H)+ calcd …": the parentheses hold the ion, read next
        c.Pos = close + 1;
        return text;
    }

    /// <summary>"M+H", "M + Na", "M–H": an ion written in parentheses, not an ionisation method.</summary>
    private static bool LooksLikeIon(string text) =>
        text.StartsWith('M') && text.Length > 1 && text.Skip(1).SkipWhile(TextCursor.IsSpace).FirstOrDefault() is '+' or '-' or '−' or '–';

    private static void SkipPunctuation(TextCursor c)
    {
        c.SkipSpaces();
        while (c.Current is ':' or '=' or ',')
        {
            c.Pos++;
            c.SkipSpaces();
        }
    }

    /// <summary>Longest bracketed ion label looked at ("[M + H + CH3CN]+" is 16), so an unclosed bracket never
    /// swallows the rest of the text.</summary>
    private const int MaxBracketedLabel = 40;

    /// <summary>
    /// "[M + H]+", "(M+H)+", "[M+Na]⁺", "[M−H]−", "[M–H]–", "[M+2H]²⁺", "M+•", "MH+", "MNa+" with blanks removed,
    /// dashes and superscripts made plain.
    /// </summary>
    private static string? ReadIonLabel(TextCursor c)
    {
        var start = c.Pos;
        if (c.Current is '[' or '(')
        {
            var close = CloseOnSameLine(c.Text, c.Pos, c.Current == '[' ? ']' : ')');
            if (close < 0) return null;
            c.Pos = close + 1;
        }
        else if (c.Current == 'M' && (IsCharge(c.PeekAt(1)) || c.PeekAt(1) is '•' or '·')) c.Pos++;
        else if (c.Current == 'M' && AdductThenCharge(c.Text, c.Pos + 1) is { } end) c.Pos = end;
        else return null;
        while (IsCharge(c.Current) || c.Current is '•' or '·' || (IsChargeDigit(c.Current) && IsCharge(c.PeekAt(1)))) c.Pos++;
        return string.Concat(c.Text[start..c.Pos].Where(ch => !TextCursor.IsSpace(ch)).Select(Plain));
    }

    private static int CloseOnSameLine(string text, int open, char closing)
    {
        for (var i = open + 1; i < text.Length && i - open <= MaxBracketedLabel; i++)
        {
            if (text[i] == closing) return i;
            if (text[i] is '\n' or '\r') return -1;
        }

        return -1;
    }

    /// <summary>"MH+", "MNa+", "MNH4+": adduct symbols right after M, then a charge; returns where the charge starts.</summary>
    private static int? AdductThenCharge(string text, int from)
    {
        var i = from;
        while (i < text.Length && (char.IsAsciiLetter(text[i]) || char.IsAsciiDigit(text[i]))) i++;
        return i > from && char.IsAsciiLetterUpper(text[from]) && i < text.Length && IsCharge(text[i]) ? i : null;
    }

    private static bool IsCharge(char ch) => ch is '+' or '-' or '⁺' or '⁻' or '−' or '–';

    private static bool IsChargeDigit(char ch) => TextCursor.IsDigit(ch) || ch is '²' or '³';

    private static char Plain(char ch) => ch switch { '⁺' => '+', '⁻' or '−' or '–' => '-', '·' => '•', '²' => '2', '³' => '3', _ => ch };

    private static string ReadFormula(TextCursor c)
    {
        var start = c.Pos;
        while (char.IsAsciiLetterOrDigit(c.Current) || c.Current is '(' or ')') c.Pos++;
        while (c.Current is '+' or '-' or '⁺' or '⁻' or '•') c.Pos++;
        var text = c.Text[start..c.Pos];
        return text.Length > 0 && char.IsAsciiLetterUpper(text[0]) ? text : Reset(c, start);
    }

    private static string Reset(TextCursor c, int start)
    {
        c.Pos = start;
        return "";
    }

    private static HrmsClaim? Fail(TextCursor c, ProblemSink sink, string expected)
    {
        sink.Add(c.Pos, c.Fragment(c.Pos), expected);
        while (!c.AtEnd && c.Current is not ('\n' or '\r') && !(c.Current == '.' && ListEnd.IsTerminator(c.Text, c.Pos))) c.Pos++;
        return null;
    }
}
