namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>Splits a JCAMP-DX text into labelled data records; strips $$ comments.</summary>
internal static class JcampLexer
{
    public static List<JcampRecord> Read(string text, JcampProblemSink sink)
    {
        var records = new List<JcampRecord>();
        (string Label, string Raw, JcampLine Value, List<JcampLine> More)? current = null;
        var number = 0;
        foreach (var raw in Lines(text))
        {
            number++;
            var line = StripComment(raw);
            if (line.StartsWith("##", StringComparison.Ordinal))
            {
                if (current is { } done) records.Add(new(done.Label, done.Raw, done.Value, done.More));
                current = ReadLabel(line, number, sink);
            }
            else if (current is { } open) open.More.Add(new(number, line, 0));
            else if (line.Trim().Length > 0) sink.Add(number, 1, line, JcampMessages.ExpectedLabelEquals);
        }
        if (current is { } last) records.Add(new(last.Label, last.Raw, last.Value, last.More));
        return records;
    }

    private static (string, string, JcampLine, List<JcampLine>)? ReadLabel(string line, int number, JcampProblemSink sink)
    {
        var equals = line.IndexOf('=');
        if (equals < 0)
        {
            sink.Add(number, 1, line, JcampMessages.ExpectedLabelEquals);
            return null;
        }
        var raw = line[2..equals];
        return (JcampRecord.Normalise(raw), raw.Trim(), new JcampLine(number, line[(equals + 1)..], equals + 1), []);
    }

    /// <summary>Text before "$$" (JCAMP-DX comment to end of line).</summary>
    private static string StripComment(string line)
    {
        var comment = line.IndexOf("$$", StringComparison.Ordinal);
        return comment < 0 ? line : line[..comment];
    }

    /// <summary>Lines split at CR LF, LF or a lone CR (older Macintosh files).</summary>
    private static IEnumerable<string> Lines(string text)
    {
        var start = 0;
        for (var i = 0; i < text.Length; i++)
        {
            if (text[i] is not ('\n' or '\r')) continue;
            yield return text[start..i];
            if (text[i] == '\r' && i + 1 < text.Length && text[i + 1] == '\n') i++;
            start = i + 1;
        }
        if (start < text.Length) yield return text[start..];
    }
}
