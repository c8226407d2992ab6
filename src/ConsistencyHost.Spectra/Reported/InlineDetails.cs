namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// The table-cell form where details follow the shift after a comma: "7.28, d (8.5)", "1.31, d (6.4), 3H",
/// "1.65, m, 2H", "2.03, overlapped" (Source: PMC tables cited in docs/spectra.md).
/// </summary>
internal static class InlineDetails
{
    /// <summary>Reads inline items into the draft when the text after the comma at the cursor is a multiplicity.</summary>
    public static void TryRead(TextCursor c, SignalDraft draft, bool decimalComma, ProblemSink sink)
    {
        if (draft.HasDetails || c.Current != ',' || !LetterFollows(c)) return;
        var items = new List<DetailItem>();
        while (c.Current == ',' && NextItem(c, items.Count == 0) is { } item)
        {
            items.Add(item);
            c.Pos = item.Offset + item.Text.Length;
            c.SkipSpacesOnLine();
        }
        if (items.Count == 0) return;
        draft.HasDetails = true;
        DetailsReader.Read(items, draft, decimalComma, sink);
    }

    /// <summary>Cheap first test: inline details start with a letter ("d (8.5)", "m", "br s"), never a digit.</summary>
    private static bool LetterFollows(TextCursor c)
    {
        var i = c.Pos + 1;
        while (i < c.Text.Length && TextCursor.IsSpace(c.Text[i])) i++;
        return i < c.Text.Length && char.IsLetter(c.Text[i]);
    }

    private static DetailItem? NextItem(TextCursor c, bool first)
    {
        var start = c.Pos + 1;
        while (start < c.Text.Length && TextCursor.IsSpace(c.Text[start])) start++;
        var end = ItemEnd(c.Text, start);
        if (end <= start) return null;
        var text = c.Text[start..end].TrimEnd();
        // TrimEnd also drops whitespace that IsSpace does not skip (form feed, vertical tab): nothing may be left.
        if (text.Length == 0) return null;
        var probe = new TextCursor(c.Text) { Pos = start };
        if (HeaderReader.IsAt(probe) || HrmsReader.IsAt(probe)) return null;
        var head = text.IndexOf('(') is var open and > 0 ? text[..open].TrimEnd() : text;
        var accept = first ? Model.Multiplicity.TryParse(head, out _) : IsCount(text) || char.IsLetter(text[0]);
        return accept ? new DetailItem(start, text) : null;
    }

    private static bool IsCount(string text) =>
        char.IsAsciiDigit(text[0]) && text[^1] is 'H' or 'C' or 'F' or 'P' && !text.EndsWith("Hz", StringComparison.Ordinal);

    /// <summary>End of an inline item: the next top-level ',' or ';', a closing '.', or a line end.</summary>
    private static int ItemEnd(string text, int start)
    {
        var depth = 0;
        for (var i = start; i < text.Length; i++)
        {
            var ch = text[i];
            if (ch == '(') depth++;
            else if (ch == ')') depth--;
            else if (depth == 0 && (ch is ',' or ';' or '\n' or '\r' || (ch == '.' && ListEnd.IsTerminator(text, i))))
                return i;
        }
        return text.Length;
    }
}
