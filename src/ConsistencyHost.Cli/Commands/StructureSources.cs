using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Molfile;
using ConsistencyHost.Chemistry.Reading;
using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Cli.CommandLine;

namespace ConsistencyHost.Cli.Commands;

/// <summary>One structure to describe: its id and either a molecule or the reason it could not be read.</summary>
internal sealed record StructureItem(string Id, Molecule? Molecule, string? Error);

/// <summary>
/// Streams structures from --smiles, --molfile, or a file: an SD file (records with "M  END"/"$$$$") or one
/// SMILES per line with an optional id after a tab (blank lines and lines starting with '#' skipped).
/// </summary>
internal static class StructureSources
{
    public static IEnumerable<StructureItem> From(ParsedArguments args)
    {
        if (args.Value("--smiles") is { } smiles) return [FromResult("1", SmilesReader.Read(smiles))];
        if (args.Value("--molfile") is { } molfile) return [FromResult(Path.GetFileNameWithoutExtension(molfile), MolfileReader.Read(CheckCommand.ReadFile(molfile, "--molfile")))];
        var file = args.Value("--file") ?? (args.Positional.Count == 1 ? args.Positional[0] : null)
            ?? throw new UsageException("give --smiles TEXT, --molfile PATH or a file of structures");
        if (!File.Exists(file)) throw new UsageException($"structure file '{file}' does not exist");
        return LooksLikeSdf(file) ? FromSdf(file) : FromSmilesLines(file);
    }

    private static bool LooksLikeSdf(string path)
    {
        var extension = Path.GetExtension(path).ToLowerInvariant();
        if (extension is ".sdf" or ".sd" or ".mol") return true;
        using var reader = new StreamReader(path);
        var buffer = new char[8192];
        var text = new string(buffer, 0, reader.Read(buffer, 0, buffer.Length));
        return text.Contains("M  END", StringComparison.Ordinal) || text.Contains("$$$$", StringComparison.Ordinal);
    }

    private static IEnumerable<StructureItem> FromSdf(string path)
    {
        using var reader = new StreamReader(path);
        foreach (var record in SdfReader.Read(reader))
        {
            var id = record.Title.Trim().Length > 0 ? record.Title.Trim() : (record.Index + 1).ToString(System.Globalization.CultureInfo.InvariantCulture);
            yield return FromResult(id, record.Molecule);
        }
    }

    private static IEnumerable<StructureItem> FromSmilesLines(string path)
    {
        using var reader = new StreamReader(path);
        var lineNumber = 0;
        while (reader.ReadLine() is { } line)
        {
            lineNumber++;
            if (line.Trim().Length == 0 || line.TrimStart().StartsWith('#')) continue;
            var tab = line.IndexOf('\t', StringComparison.Ordinal);
            var smiles = tab >= 0 ? line[..tab] : line.Trim();
            var id = tab >= 0 && line[(tab + 1)..].Trim().Length > 0 ? line[(tab + 1)..].Trim() : lineNumber.ToString(System.Globalization.CultureInfo.InvariantCulture);
            yield return FromResult(id, SmilesReader.Read(smiles.Trim()));
        }
    }

    private static StructureItem FromResult(string id, ReadResult<Molecule> result) =>
        result.Succeeded
            ? new StructureItem(id, result.Value, null)
            : new StructureItem(id, null, string.Join("; ", result.Problems.Where(p => p.Severity == ProblemSeverity.Error).Select(Describe)));

    private static string Describe(ReadProblem problem) => problem switch
    {
        { Line: > 0 } => $"line {problem.Line}, column {problem.Column}: {problem.Message}",
        { Offset: >= 0 } => $"at offset {problem.Offset}: {problem.Message}",
        _ => problem.Message,
    };
}
