namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>A physical line of the SD text with its 1-based number.</summary>
internal readonly record struct SdLine(int Number, string Text);

/// <summary>One data item: "&gt;  &lt;TAG&gt;" and its lines up to the blank line.</summary>
internal sealed record SdTag(string Name, int HeaderLine, IReadOnlyList<SdLine> Lines);

/// <summary>One SD record: the MOL block and its data items.</summary>
internal sealed record SdRecord(int FirstLine, string MolfileText, int? AtomCount, IReadOnlyList<SdTag> Tags);

/// <summary>Splits SD text at "$$$$" into records, each a MOL block ending at "M  END" plus data items.</summary>
internal static class SdRecordSplitter
{
    public static List<SdRecord> Split(string text, NmredataProblemSink sink)
    {
        var records = new List<SdRecord>();
        var current = new List<SdLine>();
        var number = 0;
        foreach (var line in text.Split('\n'))
        {
            number++;
            var clean = line.TrimEnd('\r');
            if (clean.Trim() == "$$$$")
            {
                AddRecord(current, records, sink);
                current = [];
            }
            else current.Add(new SdLine(number, clean));
        }
        if (current.Any(l => l.Text.Trim().Length > 0)) AddRecord(current, records, sink);
        return records;
    }

    private static void AddRecord(List<SdLine> lines, List<SdRecord> records, NmredataProblemSink sink)
    {
        var end = lines.FindIndex(l => l.Text.TrimEnd() == "M  END");
        if (end < 0)
        {
            var first = lines.Count > 0 ? lines[0] : new SdLine(1, "");
            sink.Add(first.Number, first.Text, NmredataMessages.ExpectedMolEnd);
            return;
        }
        var mol = string.Join('\n', lines.Take(end + 1).Select(l => l.Text));
        records.Add(new SdRecord(lines[0].Number, mol, AtomCount(lines, end), Tags(lines.Skip(end + 1).ToList(), sink)));
    }

    /// <summary>Atom count from a V2000 counts line (fourth line) or a V3000 COUNTS line; null when unreadable.</summary>
    private static int? AtomCount(List<SdLine> lines, int end)
    {
        if (end >= 3 && lines[3].Text.Length >= 3 && int.TryParse(lines[3].Text.AsSpan(0, 3), out var v2000) && !lines[3].Text.Contains("V3000"))
            return v2000;
        var counts = lines.Take(end).FirstOrDefault(l => l.Text.StartsWith("M  V30 COUNTS", StringComparison.Ordinal));
        var parts = counts.Text?.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        return parts is { Length: > 3 } && int.TryParse(parts[3], out var v3000) ? v3000 : null;
    }

    private static List<SdTag> Tags(List<SdLine> lines, NmredataProblemSink sink)
    {
        var tags = new List<SdTag>();
        var i = 0;
        while (i < lines.Count)
        {
            var line = lines[i++];
            if (line.Text.Trim().Length == 0) continue;
            if (TagName(line.Text) is not { } name)
            {
                sink.Add(line.Number, line.Text, NmredataMessages.ExpectedTagHeader);
                continue;
            }
            var body = new List<SdLine>();
            while (i < lines.Count && lines[i].Text.Trim().Length > 0) body.Add(lines[i++]);
            tags.Add(new SdTag(name, line.Number, body));
        }
        return tags;
    }

    /// <summary>The name between '&lt;' and '&gt;' of a header line starting with '&gt;'.</summary>
    private static string? TagName(string text)
    {
        if (!text.StartsWith('>')) return null;
        var open = text.IndexOf('<');
        var close = open < 0 ? -1 : text.IndexOf('>', open);
        return close > open + 1 ? text[(open + 1)..close] : null;
    }
}
