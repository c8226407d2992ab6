using System.Globalization;
using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Molfile;
using ConsistencyHost.Chemistry.Reading;
using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Sdk.Entries;

namespace ConsistencyHost.Engine.Intake;

/// <summary>Reads the submitted structure; any error makes the entry unusable, with the reader's position.</summary>
internal static class StructureIntake
{
    public static Molecule Read(StructureSource source, int maxAtoms)
    {
        var field = EntryIntake.StructureField(source);
        var result = source.Format == StructureFormat.Smiles
            ? SmilesReader.Read(source.Text.Trim())
            : MolfileReader.Read(source.Text);
        if (result.Succeeded)
        {
            return result.Value!.AtomCount <= maxAtoms
                ? result.Value
                : throw new EntryInputException(field, $"has {result.Value.AtomCount} atoms; the limit is {maxAtoms}");
        }

        var errors = result.Problems.Where(p => p.Severity == ProblemSeverity.Error).Select(Describe).ToList();
        throw new EntryInputException(field, errors.Count > 0 ? string.Join("; ", errors) : "the structure could not be read");
    }

    private static string Describe(ReadProblem problem)
    {
        if (problem.Line > 0)
        {
            return string.Create(CultureInfo.InvariantCulture, $"line {problem.Line}, column {problem.Column}: {problem.Message}");
        }

        return problem.Offset >= 0
            ? string.Create(CultureInfo.InvariantCulture, $"at offset {problem.Offset}: {problem.Message}")
            : problem.Message;
    }
}
