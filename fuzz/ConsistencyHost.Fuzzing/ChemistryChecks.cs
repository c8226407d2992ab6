using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Molfile;
using ConsistencyHost.Chemistry.Reading;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Fuzzing;

/// <summary>Harnesses for the structure readers: read, check positions, and round-trip what was read.</summary>
internal static class ChemistryChecks
{
    public static void Smiles(string text)
    {
        var result = SmilesReader.Read(text);
        foreach (var p in result.Problems)
        {
            Invariant.Require(p.Offset >= 0 && p.Offset <= text.Length, $"SMILES problem offset {p.Offset} outside 0..{text.Length}: {p.Message}");
        }

        RoundTrip(result);
    }

    public static void Molfile(string text)
    {
        var result = MolfileReader.Read(text);
        RequireLines(result.Problems);
        RoundTrip(result);
    }

    public static void Sdf(string text)
    {
        foreach (var record in SdfReader.Read(new StringReader(text)))
        {
            RequireLines(record.Problems);
            RequireLines(record.Molecule.Problems);
            RoundTrip(record.Molecule);
        }
    }

    private static void RequireLines(IEnumerable<ReadProblem> problems)
    {
        foreach (var p in problems)
        {
            Invariant.Require(p.Line >= 1, $"molfile problem without a line: {p.Message}");
        }
    }

    /// <summary>A molecule that was read can be written as SMILES, and that SMILES reads back with the same graph size.</summary>
    private static void RoundTrip(ReadResult<Molecule> result)
    {
        // An empty connection table is a valid molfile, but "" is not a SMILES (the reader says so): no round trip.
        if (result.Value is not { } molecule || molecule.AtomCount == 0)
        {
            return;
        }

        var smiles = SmilesWriter.Write(molecule);
        var back = SmilesReader.Read(smiles, SmilesReadOptions.Default);
        Invariant.Require(back.Value is not null, $"written SMILES '{smiles}' does not read back: {string.Join("; ", back.Problems.Select(p => p.Message))}");
        Invariant.Require(back.Value!.AtomCount == molecule.AtomCount && back.Value.Bonds.Length == molecule.Bonds.Length,
            $"written SMILES '{smiles}' reads back as {back.Value.AtomCount} atoms / {back.Value.Bonds.Length} bonds, not {molecule.AtomCount} / {molecule.Bonds.Length}");
    }
}
