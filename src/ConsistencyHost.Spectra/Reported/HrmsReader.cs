using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Reads "HRMS (ESI) m/z: [M + H]+ calcd for C10H14NO2 180.1019; found 180.1016." and its variants
/// ("HRMS (ESI-TOF) m/z [M+Na]+ Calcd for C12H15NO3Na: 244.0944, Found 244.0941", "calc.", "calculated", decimal commas
/// "180,1019", formulas "C₈H₁₁N₄O₂⁺" and "[C9H12NO2]+", "found 182.0810 [M+H]+, C9H12NO2 requires 182.0812", and a
/// trailing "(Δ = −1.2 ppm)").
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
        ionisation ??= ReadIonisation(c); // "HRMS m/z (ESI): …"
        SkipPunctuation(c);
        var ion = ReadIonLabel(c);
        SkipPunctuation(c);
        if (c.TryWord("found")) return ReadFoundFirst(c, sink, offset, ionisation, ion);
        var early = ReadUnnamedFound(c);
        var formula = ReadFormulaBeforeCalculated(c);
        if (!TryCalculatedWord(c)) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsCalculated);
        c.TryChar('.');
        c.SkipSpaces();
        if (formula.Length == 0 && c.TryWord("for")) c.SkipSpaces();
        if (formula.Length == 0) formula = ReadFormulaWithIon(c, ref ion);
        if (formula.Length == 0) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsFormula);
        c.SkipSpaces();
        ion ??= ReadIonLabel(c);
        SkipPunctuation(c);
        if (!c.TryNumber(true, out var calcd, out var calcdDecimals)) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsMz);
        if (early.Found is { } value)
        {
            ion = EndAfterValue(c, ion);
            return new HrmsClaim(ionisation, ion, formula, calcd, value, calcdDecimals, early.Decimals, offset);
        }
        var (found, foundDecimals, ok) = ReadFound(c, sink);
        return ok ? new HrmsClaim(ionisation, ion, formula, calcd, found, calcdDecimals, foundDecimals, offset) : null;
    }

    /// <summary>"calcd for C9H12NO2 …", and "calcd for [M+H]+ C9H12NO2 …" where the ion comes before the formula.</summary>
    private static string ReadFormulaWithIon(TextCursor c, ref string? ion)
    {
        var formula = HrmsFormula.Read(c);
        if (formula.Length > 0 || ion is not null || (ion = ReadIonLabel(c)) is null) return formula;
        c.SkipSpaces();
        return HrmsFormula.Read(c);
    }

    private static bool TryCalculatedWord(TextCursor c) => c.TryWord("calcd") || c.TryWord("calculated") || c.TryWord("calc");

    /// <summary>"HRMS for C16H15BrO2: calcd 318.0255, found 318.0245": the formula before "calcd" ("" and the cursor
    /// unchanged when "calcd" does not follow, so a missing "calcd" is reported where it was due).</summary>
    private static string ReadFormulaBeforeCalculated(TextCursor c)
    {
        var start = c.Pos;
        if (!c.TryWord("for")) return "";
        c.SkipSpaces();
        var formula = HrmsFormula.Read(c);
        SkipPunctuation(c);
        var probe = c.Pos;
        if (formula.Length > 0 && TryCalculatedWord(c))
        {
            c.Pos = probe;
            return formula;
        }
        c.Pos = start;
        return "";
    }

    /// <summary>"m/z = 396.0007. Calcd for C20H13IO: 396.0006 [M]+": the found value first, without "found".</summary>
    private static (double? Found, int Decimals) ReadUnnamedFound(TextCursor c)
    {
        if (!TextCursor.IsDigit(c.Current) || !c.TryNumber(true, out var value, out var decimals)) return (null, 0);
        SkipErrorNote(c);
        SkipClauseBreak(c);
        return (value, decimals);
    }

    /// <summary>After the last value: an ion label "[M]+", "m/z", a closing ')' and a closing '.'.</summary>
    private static string? EndAfterValue(TextCursor c, string? ion)
    {
        SkipErrorNote(c);
        var before = c.Pos;
        c.SkipSpaces();
        ion ??= ReadIonLabel(c);
        c.SkipSpaces();
        c.TryWord("m/z", needBoundary: false);
        c.SkipSpaces();
        if (!c.TryChar(')') && c.Pos > before && c.Current != '.') c.Pos = before;
        if (c.Current == '.' && !TextCursor.IsDigit(c.PeekAt(1))) c.Pos++;
        return ion;
    }

    /// <summary>
    /// The RSC wording "HRMS (ESI) m/z: found 182.0810 [M+H]+, C9H12NO2 requires 182.0812" (also with the ion before
    /// the value, or the formula clause in parentheses): found first, then the formula and "requires".
    /// </summary>
    private static HrmsClaim? ReadFoundFirst(TextCursor c, ProblemSink sink, int offset, string? ionisation, string? ion)
    {
        SkipPunctuation(c);
        ion ??= ReadIonLabel(c);
        SkipPunctuation(c);
        if (!c.TryNumber(true, out var found, out var foundDecimals)) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsMz);
        SkipErrorNote(c);
        c.SkipSpaces();
        ion ??= ReadIonLabel(c);
        SkipClauseBreak(c);
        var formula = HrmsFormula.Read(c);
        if (formula.Length == 0) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsFormula);
        c.SkipSpaces();
        if (!c.TryWord("requires")) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsRequires);
        SkipPunctuation(c);
        if (c.TryWord("m/z", needBoundary: false)) SkipPunctuation(c);
        if (!c.TryNumber(true, out var calcd, out var calcdDecimals)) return Fail(c, sink, ReportedTextMessages.ExpectedHrmsMz);
        ion = EndAfterValue(c, ion);
        return new HrmsClaim(ionisation, ion, formula, calcd, found, calcdDecimals, foundDecimals, offset);
    }

    /// <summary>Skips ", ", "; ", ". " and an opening '(' between the found value and "C9H12NO2 requires".</summary>
    private static void SkipClauseBreak(TextCursor c)
    {
        c.SkipSpaces();
        while (c.Current is ',' or ';' or '.' or '(' or ':')
        {
            c.Pos++;
            c.SkipSpaces();
        }
    }

    /// <summary>
    /// Skips the mass error written after a value: "(Δ = −1.2 ppm)", "(Δ 0.8 ppm)", "(error 1.2 ppm)" (common practice);
    /// the checker computes the error itself from the two values.
    /// </summary>
    private static void SkipErrorNote(TextCursor c)
    {
        var start = c.Pos;
        c.SkipSpaces();
        if (c.Current != '(')
        {
            c.Pos = start;
            return;
        }
        var close = CloseOnSameLine(c.Text, c.Pos, ')');
        var inner = close < 0 ? "" : c.Text[(c.Pos + 1)..close].Trim();
        var isError = (inner.StartsWith('Δ') || inner.StartsWith("error", StringComparison.OrdinalIgnoreCase) || inner.StartsWith("diff", StringComparison.OrdinalIgnoreCase))
            && inner.EndsWith("ppm", StringComparison.Ordinal);
        c.Pos = isError ? close + 1 : start;
    }

    private static (double? Found, int Decimals, bool Ok) ReadFound(TextCursor c, ProblemSink sink)
    {
        SkipErrorNote(c);
        var end = c.Pos;
        c.SkipSpaces();
        if (c.Current is ';' or ',' || (c.Current == '.' && !TextCursor.IsDigit(c.PeekAt(1)))) c.Pos++;
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
        if (!c.TryNumber(true, out var found, out var decimals))
        {
            Fail(c, sink, ReportedTextMessages.ExpectedHrmsMz);
            return (null, 0, false);
        }
        SkipErrorNote(c);
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
            // An ion starts with M or a count ("[M+H]+", "[2M+Na]+"); "(Δ = 1.2 ppm)" or "(C9H12NO2 …)" is not one.
            if (close < 0 || !(c.PeekAt(1) == 'M' || TextCursor.IsDigit(c.PeekAt(1)))) return null;
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

    private static HrmsClaim? Fail(TextCursor c, ProblemSink sink, string expected)
    {
        sink.Add(c.Pos, c.Fragment(c.Pos), expected);
        while (!c.AtEnd && c.Current is not ('\n' or '\r') && !(c.Current == '.' && ListEnd.IsTerminator(c.Text, c.Pos))) c.Pos++;
        return null;
    }
}
