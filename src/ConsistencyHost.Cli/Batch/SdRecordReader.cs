namespace ConsistencyHost.Cli.Batch;

/// <summary>One SD record as text: its lines up to (not including) "$$$$" and where it starts.</summary>
internal sealed record SdRecordText(int Number, int FirstLine, IReadOnlyList<string> Lines)
{
    /// <summary>The index of the "M  END" line, or -1 when the record has none.</summary>
    public int MolBlockEnd => Lines.ToList().FindIndex(l => l.TrimEnd() == "M  END");

    /// <summary>The record's text with "\n" line ends.</summary>
    public string Text => string.Join('\n', Lines) + "\n";

    /// <summary>Data items ("&gt;  &lt;NAME&gt;" and the lines up to a blank line) after the MOL block, in order.</summary>
    public IEnumerable<(string Name, string Value)> DataItems()
    {
        for (var i = Math.Max(MolBlockEnd + 1, 0); i < Lines.Count; i++)
        {
            var header = Lines[i];
            var open = header.IndexOf('<', StringComparison.Ordinal);
            var close = open < 0 ? -1 : header.IndexOf('>', open);
            if (!header.StartsWith('>') || close < 0) continue;
            var value = new List<string>();
            while (i + 1 < Lines.Count && Lines[i + 1].Trim().Length > 0) value.Add(Lines[++i].Trim());
            yield return (header[(open + 1)..close], string.Join(' ', value));
        }
    }
}

/// <summary>Reads an SD file record by record (split at "$$$$"), never holding more than one record.</summary>
internal static class SdRecordReader
{
    public static IEnumerable<SdRecordText> Read(TextReader reader)
    {
        var lines = new List<string>();
        var lineNumber = 0;
        var first = 1;
        var number = 0;
        while (reader.ReadLine() is { } line)
        {
            lineNumber++;
            if (line.Trim() == "$$$$")
            {
                yield return new SdRecordText(++number, first, lines);
                lines = [];
                first = lineNumber + 1;
            }
            else lines.Add(line);
        }

        if (lines.Any(l => l.Trim().Length > 0)) yield return new SdRecordText(++number, first, lines);
    }

    /// <summary>Counts records without keeping them.</summary>
    public static int Count(TextReader reader)
    {
        var count = 0;
        var pending = false;
        while (reader.ReadLine() is { } line)
        {
            if (line.Trim() == "$$$$") { count++; pending = false; }
            else if (line.Trim().Length > 0) pending = true;
        }

        return count + (pending ? 1 : 0);
    }
}
