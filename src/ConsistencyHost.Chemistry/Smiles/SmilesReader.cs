using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Reads SMILES (OpenSMILES, Daylight) into a <see cref="Molecule"/>.</summary>
/// <remarks>Weininger, J. Chem. Inf. Comput. Sci. 28, 31 (1988); OpenSMILES specification (opensmiles.org).
/// Plain [H] atoms bonded to one heavy atom are folded into its hydrogen count, so atom indices count the
/// remaining atoms in written order.</remarks>
public static class SmilesReader
{
    /// <summary>Reads one SMILES string (text after the first blank is a title and ignored by default).</summary>
    public static ReadResult<Molecule> Read(string text, SmilesReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        options ??= SmilesReadOptions.Default;
        var problems = new List<ReadProblem>();
        var trimmedStart = 0;
        while (trimmedStart < text.Length && char.IsWhiteSpace(text[trimmedStart]))
        {
            trimmedStart++;
        }

        var end = EndOfSmiles(text, trimmedStart, options);
        var parser = new SmilesParser(text, problems);
        parser.Run(trimmedStart, end);
        if (problems.Exists(p => p.Severity == ProblemSeverity.Error))
        {
            return new ReadResult<Molecule>(null, problems);
        }

        var molecule = new SmilesGraphCompleter(parser, problems, options).Complete();
        var folded = HydrogenFolder.Fold(molecule).Molecule;
        var failed = problems.Exists(p => p.Severity == ProblemSeverity.Error);
        return new ReadResult<Molecule>(failed ? null : folded, problems);
    }

    private static int EndOfSmiles(string text, int start, SmilesReadOptions options)
    {
        var end = start;
        while (end < text.Length && !char.IsWhiteSpace(text[end]))
        {
            end++;
        }

        return options.AllowTitle || end == text.Length || text.AsSpan(end).Trim().IsEmpty ? end : text.Length;
    }
}
