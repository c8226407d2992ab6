using System.Globalization;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>Fixed-column field access with problems reported at line and column.</summary>
internal sealed class MolfileLines
{
    private readonly string[] lines;
    private readonly int firstLine;

    public MolfileLines(string[] lines, int firstLine, List<ReadProblem> problems)
    {
        this.lines = lines;
        this.firstLine = firstLine;
        Problems = problems;
    }

    public List<ReadProblem> Problems { get; }

    public int Count => lines.Length;

    public string this[int index] => lines[index];

    /// <summary>1-based file line number of a 0-based index.</summary>
    public int LineNumber(int index) => firstLine + index;

    /// <summary>Columns [start, start+width) trimmed ("" when the line is short).</summary>
    public static string Field(string line, int start, int width) =>
        start >= line.Length ? string.Empty : line.Substring(start, Math.Min(width, line.Length - start)).Trim();

    public int Int(int index, int start, int width, string what, int fallback = 0)
    {
        var text = Field(lines[index], start, width);
        if (text.Length == 0)
        {
            return fallback;
        }

        if (int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var value))
        {
            return value;
        }

        Error(index, start + 1, MolfileMessages.Format(MolfileMessages.BadNumber, what, text));
        return fallback;
    }

    public double Real(int index, int start, int width, string what)
    {
        var text = Field(lines[index], start, width);
        // "NaN", "Infinity" and overflowing exponents parse, but are no coordinate.
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && double.IsFinite(value))
        {
            return value;
        }

        Error(index, start + 1, MolfileMessages.Format(MolfileMessages.BadNumber, what, text));
        return 0;
    }

    public void Error(int index, int column, string message) =>
        Problems.Add(new ReadProblem(ProblemSeverity.Error, message, Line: LineNumber(index), Column: column));

    public void Warning(int index, int column, string message) =>
        Problems.Add(new ReadProblem(ProblemSeverity.Warning, message, Line: LineNumber(index), Column: column));
}
