using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>One SD-file record: its molecule (or problems), title and data items.</summary>
/// <param name="Index">0-based record number.</param>
/// <param name="FirstLine">1-based line where the record starts.</param>
/// <param name="Title">First header line of the molfile.</param>
/// <param name="Molecule">The molfile read result; problems carry file line numbers.</param>
/// <param name="Data">Data items: name from "&gt; &lt;NAME&gt;" → value lines joined with '\n'.</param>
/// <param name="Problems">Problems of the data section and record framing.</param>
public sealed record SdfRecord(
    int Index, int FirstLine, string Title, ReadResult<Molecule> Molecule,
    IReadOnlyDictionary<string, string> Data, IReadOnlyList<ReadProblem> Problems);

/// <summary>Streams SD files record by record (CTfile formats, SDfile section).</summary>
public static class SdfReader
{
    /// <summary>Reads records lazily; a malformed record is reported in its own result and reading continues.</summary>
    public static IEnumerable<SdfRecord> Read(TextReader reader)
    {
        ArgumentNullException.ThrowIfNull(reader);
        var lines = new List<string>();
        var lineNumber = 0;
        var start = 1;
        var index = 0;
        while (reader.ReadLine() is { } line)
        {
            lineNumber++;
            if (line.StartsWith("$$$$", StringComparison.Ordinal))
            {
                yield return SdfRecordParser.Parse(index++, start, lines, true);
                lines.Clear();
                start = lineNumber + 1;
                continue;
            }

            lines.Add(line);
        }

        if (lines.Exists(l => l.Trim().Length > 0))
        {
            yield return SdfRecordParser.Parse(index, start, lines, false);
        }
    }
}

/// <summary>Splits one record into its molfile and data items.</summary>
internal static class SdfRecordParser
{
    public static SdfRecord Parse(int index, int firstLine, List<string> lines, bool terminated)
    {
        var problems = new List<ReadProblem>();
        var end = lines.FindIndex(l => l.StartsWith("M  END", StringComparison.Ordinal));
        var molLines = end >= 0 ? lines.GetRange(0, end + 1) : lines;
        var molecule = MolfileReader.Read([.. molLines], firstLine);
        var data = ReadData(lines, end < 0 ? lines.Count : end + 1, firstLine, problems);
        if (!terminated)
        {
            problems.Add(new ReadProblem(ProblemSeverity.Warning, MolfileMessages.Format(MolfileMessages.MissingRecordEnd, firstLine), Line: firstLine));
        }

        return new SdfRecord(index, firstLine, lines.Count > 0 ? lines[0] : string.Empty, molecule, data, problems);
    }

    private static Dictionary<string, string> ReadData(List<string> lines, int start, int firstLine, List<ReadProblem> problems)
    {
        var data = new Dictionary<string, string>(StringComparer.Ordinal);
        var i = start;
        while (i < lines.Count)
        {
            var header = lines[i];
            if (!header.StartsWith('>'))
            {
                i++;
                continue;
            }

            var open = header.IndexOf('<', StringComparison.Ordinal);
            var close = header.IndexOf('>', open + 1);
            if (open < 0 || close < 0)
            {
                problems.Add(new ReadProblem(ProblemSeverity.Error, MolfileMessages.Format(MolfileMessages.BadDataHeader, header), Line: firstLine + i, Column: 1));
                i++;
                continue;
            }

            var value = new List<string>();
            for (i++; i < lines.Count && lines[i].Length > 0; i++)
            {
                value.Add(lines[i]);
            }

            data[header[(open + 1)..close]] = string.Join('\n', value);
        }

        return data;
    }
}
