using System.Globalization;

namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>
/// Reads the tuples of (XY..XY), (XYW..XYW), (XYM..XYM) peak tables and (XYA)/(XYWA)/(XYMA) assignment lists.
/// Components are separated by commas (with optional blanks); tuples by ';', blanks or line ends. A line without
/// commas is read as blank-separated numbers grouped by the tuple size.
/// </summary>
internal static class TupleReader
{
    public static List<RawPeak>? ReadTable(JcampRecord record, JcampProblemSink sink)
    {
        var (form, sameLine) = Form(record.Value);
        var size = form switch { "(XY..XY)" => 2, "(XYW..XYW)" or "(XYM..XYM)" => 3, _ => 0 };
        if (size == 0)
        {
            sink.Add(record.Value.Number, record.Value.ColumnOffset + 1, record.Value.Text, JcampMessages.ExpectedVariableList);
            return null;
        }
        var hasM = form == "(XYM..XYM)";
        var peaks = new List<RawPeak>();
        foreach (var line in sameLine is null ? record.Continuation : record.Continuation.Prepend(sameLine.Value))
            foreach (var tuple in Tuples(line, size, sink))
                if (ToPeak(line.Number, tuple, hasM, sink) is { } peak) peaks.Add(peak);
        return peaks;
    }

    /// <summary>The variable list "(XY..XY)" and, when tuples follow on the same line, that rest as a data line.</summary>
    private static (string Form, JcampLine? SameLine) Form(JcampLine value)
    {
        var close = value.Text.IndexOf(')');
        var form = (close < 0 ? value.Text : value.Text[..(close + 1)]).Trim().ToUpperInvariant().Replace(" ", "");
        if (close < 0 || value.Text[(close + 1)..].Trim().Length == 0) return (form, null);
        var blanks = new string(' ', value.ColumnOffset + close + 1);
        return (form, new JcampLine(value.Number, blanks + value.Text[(close + 1)..], 0));
    }

    public static List<RawPeak>? ReadAssignments(JcampRecord record, JcampProblemSink sink)
    {
        var form = record.Value.Text.Trim().ToUpperInvariant().Replace(" ", "");
        var size = form switch { "(XYA)" => 2, "(XYWA)" or "(XYMA)" => 3, _ => 0 };
        if (size == 0)
        {
            sink.Add(record.Value.Number, record.Value.ColumnOffset + 1, record.Value.Text, JcampMessages.ExpectedVariableList);
            return null;
        }
        var peaks = new List<RawPeak>();
        foreach (var line in record.Continuation.Where(l => l.Text.Trim().Length > 0))
            if (AssignmentTuple(line, size, form == "(XYMA)", sink) is { } peak) peaks.Add(peak);
        return peaks;
    }

    private static RawPeak? AssignmentTuple(JcampLine line, int size, bool hasM, JcampProblemSink sink)
    {
        var text = line.Text.Trim();
        var open = text.IndexOf('<');
        var close = text.LastIndexOf('>');
        if (!text.StartsWith('(') || !text.EndsWith(')') || open < 0 || close < open)
        {
            sink.Add(line.Number, line.Text.IndexOf(text, StringComparison.Ordinal) + 1, text, JcampMessages.ExpectedAssignmentTuple);
            return null;
        }
        var parts = text[1..open].Split(',').Select(p => p.Trim()).ToList();
        if (parts.Count > 0 && parts[^1].Length == 0) parts.RemoveAt(parts.Count - 1);
        if (parts.Count != size)
        {
            sink.Add(line.Number, line.Text.IndexOf('(') + 1, text, JcampMessages.ExpectedTupleSize);
            return null;
        }
        var column = line.Text.IndexOf('(') + 2;
        var peak = ToPeak(line.Number, [.. parts.Select(p => (column, p))], hasM, sink);
        return peak is null ? null : peak with { Assignment = text[(open + 1)..close] };
    }

    private static RawPeak? ToPeak(int line, List<(int Column, string Text)> tuple, bool hasM, JcampProblemSink sink)
    {
        var values = new double?[tuple.Count];
        for (var i = 0; i < tuple.Count; i++)
        {
            if (hasM && i == 2) continue;
            if (i > 0 && tuple[i].Text.Length == 0) continue;
            if (!double.TryParse(tuple[i].Text, NumberStyles.Float, CultureInfo.InvariantCulture, out var v))
            {
                sink.Add(line, tuple[i].Column, tuple[i].Text, JcampMessages.ExpectedNumber);
                return null;
            }
            values[i] = v;
        }
        return new RawPeak(line, tuple[0].Column, values[0]!.Value, values[1],
            !hasM && tuple.Count > 2 ? values[2] : null, hasM ? tuple[2].Text : null, null);
    }

    /// <summary>The tuples of one data line, each a list of (column, text) components.</summary>
    private static IEnumerable<List<(int Column, string Text)>> Tuples(JcampLine line, int size, JcampProblemSink sink)
    {
        var components = Components(line.Text);
        if (components.Count == 0) yield break;
        if (!line.Text.Contains(','))
        {
            for (var i = 0; i + size <= components.Count; i += size)
                yield return [.. components.Skip(i).Take(size).Select(c => (c.Column, c.Text))];
            if (components.Count % size != 0)
                sink.Add(line.Number, components[^(components.Count % size)].Column, line.Text.Trim(), JcampMessages.ExpectedTupleSize);
            yield break;
        }
        foreach (var group in components.GroupBy(c => c.Tuple))
        {
            var tuple = group.Select(c => (c.Column, c.Text)).ToList();
            if (tuple.Count == size) yield return tuple;
            else sink.Add(line.Number, tuple[0].Column, string.Join(",", tuple.Select(t => t.Text)), JcampMessages.ExpectedTupleSize);
        }
    }

    /// <summary>Components with their 1-based column and tuple number (a new tuple after a blank or ';' not next to a comma).</summary>
    private static List<(int Column, string Text, int Tuple)> Components(string text)
    {
        var result = new List<(int, string, int)>();
        var tuple = 0;
        var i = 0;
        var afterComma = false;
        while (i < text.Length)
        {
            var separated = false;
            while (i < text.Length && (char.IsWhiteSpace(text[i]) || text[i] is ';' or ','))
            {
                if (text[i] == ',') afterComma = true;
                else if (text[i] == ';' || !afterComma) separated = true;
                i++;
            }
            if (i >= text.Length) break;
            if (separated && !afterComma && result.Count > 0) tuple++;
            var start = i;
            while (i < text.Length && !char.IsWhiteSpace(text[i]) && text[i] is not (';' or ',')) i++;
            result.Add((start + 1, text[start..i], tuple));
            afterComma = false;
            var j = i;
            while (j < text.Length && text[j] is ' ' or '\t') j++;
            if (j < text.Length && text[j] == ',') { i = j; }
        }
        return result;
    }
}
