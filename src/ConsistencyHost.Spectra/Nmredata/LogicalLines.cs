namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>A logical line of a tag (continuations joined, comment removed) and the physical line it starts on.</summary>
internal readonly record struct LogicalLine(int Line, string Text);

/// <summary>
/// Turns a tag's physical lines into logical lines. With backslashes (mandatory from version 1.1): line ends are
/// ignored and each '\' ends a logical line. Without (version 1.0 and older files): each physical line is one.
/// Everything after ';' is a comment (NMReDATA tag format, Pupier et al. 2018).
/// </summary>
internal static class LogicalLines
{
    public static List<LogicalLine> Of(SdTag tag, bool version11, NmredataProblemSink sink)
    {
        var raw = tag.Lines.Any(l => l.Text.Contains('\\')) ? Joined(tag.Lines) : [.. tag.Lines.Select(l => new LogicalLine(l.Number, l.Text))];
        if (version11 && tag.Lines.Count > 1 && !tag.Lines.Any(l => l.Text.Contains('\\')))
            sink.Add(tag.Lines[0].Number, tag.Lines[0].Text, NmredataMessages.ExpectedBackslash, ProblemSeverity.Warning);
        return [.. raw.Select(l => l with { Text = StripComment(l.Text).Trim() }).Where(l => l.Text.Length > 0)];
    }

    private static List<LogicalLine> Joined(IReadOnlyList<SdLine> lines)
    {
        var result = new List<LogicalLine>();
        var text = new System.Text.StringBuilder();
        var start = lines[0].Number;
        foreach (var line in lines)
        {
            if (text.Length == 0) start = line.Number;
            foreach (var c in line.Text)
            {
                if (c != '\\')
                {
                    text.Append(c);
                    continue;
                }
                result.Add(new LogicalLine(start, text.ToString()));
                text.Clear();
                start = line.Number;
            }
        }
        if (text.ToString().Trim().Length > 0) result.Add(new LogicalLine(start, text.ToString()));
        return result;
    }

    /// <summary>Text before the first ';' that is not inside a quoted label &lt;"…"&gt;.</summary>
    private static string StripComment(string text)
    {
        var quoted = false;
        for (var i = 0; i < text.Length; i++)
        {
            if (text[i] == '"') quoted = !quoted;
            else if (text[i] == ';' && !quoted) return text[..i];
        }
        return text;
    }
}
