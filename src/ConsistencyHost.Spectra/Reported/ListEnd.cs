namespace ConsistencyHost.Spectra.Reported;

/// <summary>Where a signal list ends and how to skip past a fragment that could not be read.</summary>
internal static class ListEnd
{
    /// <summary>
    /// A '.' ends a list when it follows a digit or ')' (or "ppm") and precedes a blank or the end, or when the next
    /// header follows it with no blank ("…, 21.3.13C NMR", as PDF text layers join lines).
    /// </summary>
    public static bool IsTerminator(string text, int i)
    {
        if (i + 1 < text.Length && !TextCursor.IsSpace(text[i + 1]))
            return i > 0 && text[i - 1] is ')' or (>= '0' and <= '9') && text[i + 1] is '1' or '3' or '¹' or '³' or 'δ' && HeaderFollows(text, i + 1);
        if (i == 0) return false;
        var previous = text[i - 1];
        if (char.IsAsciiDigit(previous) || previous == ')') return true;
        if (i >= 3 && string.CompareOrdinal(text, i - 3, "ppm", 0, 3) == 0) return true;
        var probe = new TextCursor(text) { Pos = i + 1 };
        probe.SkipSpaces();
        return probe.AtEnd || HeaderReader.IsAt(probe) || HrmsReader.IsAt(probe);
    }

    private static bool HeaderFollows(string text, int at) => HeaderReader.IsAt(new TextCursor(text) { Pos = at });

    /// <summary>
    /// Skips to just after the next top-level ',' or ';' (returns false: the list goes on), or to a closing '.',
    /// a header or the end (returns true: the list is over).
    /// </summary>
    public static bool SkipPastFault(TextCursor c)
    {
        var depth = 0;
        while (!c.AtEnd)
        {
            var ch = c.Current;
            if (ch == '(') depth++;
            else if (ch == ')') depth = Math.Max(0, depth - 1);
            else if (depth == 0 && ch is ',' or ';' && !IsInsideNumber(c))
            {
                c.Pos++;
                return false;
            }
            else if (depth == 0 && ch == '.' && IsTerminator(c.Text, c.Pos))
            {
                c.Pos++;
                return true;
            }
            else if (depth == 0 && c.Pos > 0 && TextCursor.IsSpace(c.Text[c.Pos - 1]) && (HeaderReader.IsAt(c) || HrmsReader.IsAt(c)))
                return true;
            c.Pos++;
        }
        return true;
    }

    private static bool IsInsideNumber(TextCursor c) =>
        c.Current == ',' && TextCursor.IsDigit(c.PeekAt(-1)) && TextCursor.IsDigit(c.PeekAt(1));
}
