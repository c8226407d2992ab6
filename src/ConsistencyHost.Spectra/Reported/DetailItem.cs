namespace ConsistencyHost.Spectra.Reported;

/// <summary>One comma- or semicolon-separated item of a signal's details, with its offset in the text.</summary>
internal readonly record struct DetailItem(int Offset, string Text)
{
    /// <summary>Splits [start, end) at top-level ',' and ';' (a decimal comma between digits stays inside).</summary>
    public static List<DetailItem> Split(string text, int start, int end, bool decimalComma)
    {
        var items = new List<DetailItem>();
        var depth = 0;
        var itemStart = start;
        for (var i = start; i <= end; i++)
        {
            var ch = i < end ? text[i] : ',';
            if (ch == '(') depth++;
            else if (ch == ')') depth--;
            if (i < end && (depth > 0 || (ch != ',' && ch != ';'))) continue;
            if (i < end && decimalComma && ch == ',' && IsDigitAt(text, i - 1) && IsDigitAt(text, i + 1)) continue;
            if (i < end && ch == ',' && IsTypedCouplingComma(text, i)) continue;
            items.Add(Trimmed(text, itemStart, i));
            itemStart = i + 1;
        }
        return items;
    }

    /// <summary>The comma of "2JC,F = 21.0 Hz": J, a nucleus letter, the comma, a nucleus letter.</summary>
    private static bool IsTypedCouplingComma(string text, int i) =>
        i >= 2 && i + 1 < text.Length && text[i - 2] == 'J' && IsNucleusLetter(text[i - 1]) && IsNucleusLetter(text[i + 1]);

    private static bool IsNucleusLetter(char ch) => ch is 'H' or 'F' or 'P' or 'C';

    private static bool IsDigitAt(string text, int i) => i >= 0 && i < text.Length && char.IsAsciiDigit(text[i]);

    private static DetailItem Trimmed(string text, int start, int end)
    {
        while (start < end && TextCursor.IsSpace(text[start])) start++;
        while (end > start && TextCursor.IsSpace(text[end - 1])) end--;
        return new(start, text[start..end]);
    }
}
