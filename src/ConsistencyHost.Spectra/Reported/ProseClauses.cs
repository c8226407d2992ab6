namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Recognises the non-NMR clauses of a pasted characterisation paragraph (common practice in ACS/RSC experimental
/// sections: Rf, mp, IR, elemental analysis, yield, optical rotation, appearance) so a lenient read can skip them
/// with a note instead of calling them unreadable. Text that is neither such a clause nor data stays a problem.
/// </summary>
internal static class ProseClauses
{
    private const string ElementalAnalysis = "elemental analysis";

    // Checked in order, case-insensitively, at the start of a clause; a word must end at a non-letter.
    private static readonly (string Word, string Kind)[] Known =
    [
        ("Rf", "Rf"), ("R f", "Rf"), ("TLC", "Rf"),
        ("mp", "mp"), ("m.p.", "mp"), ("melting point", "mp"), ("bp", "bp"), ("b.p.", "bp"),
        ("FTIR", "IR"), ("FT-IR", "IR"), ("IR", "IR"), ("UV", "UV"),
        ("Anal.", ElementalAnalysis), ("Anal", ElementalAnalysis), ("Elemental analysis", ElementalAnalysis),
        ("Calcd for C", ElementalAnalysis), ("Found: C", ElementalAnalysis), ("Found C", ElementalAnalysis),
        ("Yield", "yield"), ("[α]", "optical rotation"), ("[a]D", "optical rotation"), ("αD", "optical rotation"),
        ("LRMS", "low-resolution MS"), ("MS (", "low-resolution MS"), ("GC-MS", "low-resolution MS"), ("LC-MS", "low-resolution MS"),
        ("EI-MS", "low-resolution MS"), ("ESI-MS", "low-resolution MS"), ("EIMS", "low-resolution MS"), ("ESIMS", "low-resolution MS"),
        ("MS", "low-resolution MS"), ("m/z", "low-resolution MS"),
        ("white", "appearance"), ("colourless", "appearance"), ("colorless", "appearance"), ("yellow", "appearance"),
        ("pale", "appearance"), ("brown", "appearance"), ("orange", "appearance"), ("off-white", "appearance"),
    ];

    /// <summary>The kind of prose clause starting at <paramref name="pos"/>, or null.</summary>
    public static string? KindAt(string text, int pos)
    {
        // "85% yield", "85 % yield": a percentage followed by the word.
        if (pos < text.Length && TextCursor.IsDigit(text[pos]))
        {
            var p = pos;
            while (p < text.Length && (TextCursor.IsDigit(text[p]) || text[p] is '.' or ' ' or '%')) p++;
            return p > pos && text[p - 1] is '%' or ' ' && Matches(text, p, "yield") ? "yield" : null;
        }

        foreach (var (word, kind) in Known)
        {
            if (Matches(text, pos, word)) return kind;
        }

        return null;
    }

    private static bool Matches(string text, int pos, string word) =>
        string.Compare(text, pos, word, 0, word.Length, StringComparison.OrdinalIgnoreCase) == 0
        && pos + word.Length <= text.Length
        && (!char.IsLetter(word[^1]) || pos + word.Length == text.Length || !char.IsLetter(text[pos + word.Length]));

    /// <summary>
    /// Splits [<paramref name="start"/>, <paramref name="end"/>) into clauses at ';' and at '.' before a blank
    /// (never inside brackets or in a decimal), calling <paramref name="clause"/> with each clause's bounds.
    /// </summary>
    public static void Split(string text, int start, int end, Action<int, int> clause)
    {
        var depth = 0;
        var from = start;
        for (var i = start; i < end; i++)
        {
            var ch = text[i];
            if (ch is '(' or '[') depth++;
            else if (ch is ')' or ']') depth = Math.Max(0, depth - 1);
            else if (depth == 0 && (ch == ';' || (ch == '.' && (i + 1 == end || TextCursor.IsSpace(text[i + 1])))))
            {
                // "Anal. Calcd for C10H12O2: C, 73.15; H, 7.37": the ';' separates the elements of one analysis.
                if (ch == ';' && KindAt(text, SkipBlanks(text, from, i)) == ElementalAnalysis) continue;
                // "Anal." and "m.p." keep their dot: a clause is never just the abbreviation.
                if (ch == '.' && KindAt(text, from) is not null && IsAbbreviationDot(text, from, i)) continue;
                Emit(text, from, i, clause);
                from = i + 1;
            }
        }

        Emit(text, from, end, clause);
    }

    private static int SkipBlanks(string text, int from, int to)
    {
        while (from < to && TextCursor.IsSpace(text[from])) from++;
        return from;
    }

    private static bool IsAbbreviationDot(string text, int from, int dot) =>
        dot - from <= 5 && text.AsSpan(from, dot - from + 1).Trim().ToString() is "Anal." or "m.p." or "b.p." or "Anal. Calcd.";

    private static void Emit(string text, int from, int to, Action<int, int> clause)
    {
        while (from < to && (TextCursor.IsSpace(text[from]) || text[from] is ',' or '.')) from++;
        if (from < to) clause(from, to);
    }
}
