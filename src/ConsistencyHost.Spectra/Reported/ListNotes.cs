namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Notes written among the signals rather than inside a signal's details: a clause after the list
/// ("…, 1.25 (t, 3H); rotamers observed.", "; OH not observed."), a parenthesised sentence after it
/// ("(Hydroxyl signal was not observed.)") and a bracketed note after a signal ("[minor rotamer: 4.02 (s)]").
/// </summary>
/// <remarks>Common practice in experimental sections. Only text that <see cref="SignalNotes"/> knows as a note is
/// taken: anything else stays a problem, so a misspelt signal is never swallowed as prose.</remarks>
internal static class ListNotes
{
    /// <summary>Longest bracketed note looked at, so an unclosed '[' never swallows the rest of the text.</summary>
    private const int MaxBracketed = 200;

    /// <summary>
    /// Reads a note clause at the cursor (a letter or '(' where a signal was due) up to the next ',', ';', closing
    /// '.', line end or end of text; the cursor stops at that delimiter. Null (cursor unchanged) when not a note.
    /// </summary>
    public static string? TryReadClause(TextCursor c)
    {
        if (c.Current == '(') return TryReadParenthesised(c);
        if (!char.IsLetter(c.Current)) return null;
        var t = c.Text;
        var end = c.Pos;
        while (end < t.Length && t[end] is not (',' or ';' or '\n' or '\r' or '(' or '[') && !(t[end] == '.' && IsSentenceEnd(t, end))) end++;
        var note = t[c.Pos..end].Trim();
        if (!SignalNotes.IsNote(note)) return null;
        c.Pos = end;
        return note;
    }

    /// <summary>"[minor rotamer: 4.02 (s)]" or "[rotamers 3:2]" at the cursor; the cursor moves past ']'.</summary>
    public static string? TryReadBracketed(TextCursor c)
    {
        if (c.Current != '[') return null;
        var t = c.Text;
        var close = t.IndexOf(']', c.Pos, Math.Min(MaxBracketed, t.Length - c.Pos));
        if (close < 0) return null;
        var inner = t[(c.Pos + 1)..close].Trim();
        if (!SignalNotes.IsNote(inner)) return null;
        c.Pos = close + 1;
        return inner;
    }

    private static string? TryReadParenthesised(TextCursor c)
    {
        var close = c.MatchingParen(c.Pos);
        if (close < 0) return null;
        var note = c.Text[(c.Pos + 1)..close].Trim().TrimEnd('.').TrimEnd();
        if (!SignalNotes.IsNote(note)) return null;
        c.Pos = close + 1;
        return note;
    }

    private static bool IsSentenceEnd(string t, int dot) => dot + 1 >= t.Length || TextCursor.IsSpace(t[dot + 1]);
}
