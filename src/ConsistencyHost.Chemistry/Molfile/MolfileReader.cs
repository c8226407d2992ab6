using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>Reads MDL molfiles (CTfile V2000 and V3000) into a <see cref="Molecule"/>.</summary>
/// <remarks>CTfile formats (MDL, later BIOVIA). Plain explicit H atoms are folded into their heavy atom after
/// stereo perception, so heavy-atom indices are the molfile atom numbers minus one, renumbered densely skipping
/// the folded hydrogens. Wedge/hash bonds with 2D coordinates give tetrahedral configurations; 2D coordinates
/// give double-bond cis/trans unless the bond is drawn "either".</remarks>
public static class MolfileReader
{
    /// <summary>Reads one molfile.</summary>
    public static ReadResult<Molecule> Read(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var lines = text.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n');
        var count = lines.Length;
        while (count > 4 && lines[count - 1].Trim().Length == 0)
        {
            count--;
        }

        return Read(lines[..count], 1);
    }

    internal static ReadResult<Molecule> Read(string[] rawLines, int firstLine)
    {
        var problems = new List<ReadProblem>();
        var lines = new MolfileLines(rawLines, firstLine, problems);
        if (rawLines.Length < 4)
        {
            problems.Add(new ReadProblem(ProblemSeverity.Error, MolfileMessages.Format(MolfileMessages.TooShort, rawLines.Length), Line: firstLine));
            return new ReadResult<Molecule>(null, problems);
        }

        var table = ReadTable(lines);
        if (table is null || problems.Exists(p => p.Severity == ProblemSeverity.Error))
        {
            return new ReadResult<Molecule>(null, problems);
        }

        var molecule = MolfileAssembler.Build(table, problems);
        var failed = problems.Exists(p => p.Severity == ProblemSeverity.Error);
        return new ReadResult<Molecule>(failed ? null : molecule, problems);
    }

    private static MolfileTable? ReadTable(MolfileLines lines)
    {
        var counts = lines[3];
        var version = counts.Length >= 39 ? counts.Substring(33, Math.Min(6, counts.Length - 33)).Trim() : counts.Contains("V3000", StringComparison.Ordinal) ? "V3000" : "V2000";
        var table = new MolfileTable();
        if (version == "V3000")
        {
            V3000Ctab.Read(lines, 4, table);
            return table;
        }

        if (version != "V2000")
        {
            lines.Error(3, 34, MolfileMessages.Format(MolfileMessages.UnknownVersion, version));
            return null;
        }

        var atoms = lines.Int(3, 0, 3, "atom count", -1);
        var bonds = lines.Int(3, 3, 3, "bond count", -1);
        if (atoms < 0 || bonds < 0)
        {
            lines.Error(3, 1, MolfileMessages.BadCountsLine);
            return null;
        }

        V2000AtomBlock.Read(lines, 4, atoms, table);
        V2000BondBlock.Read(lines, 4 + atoms, bonds, table);
        V2000PropertiesBlock.Read(lines, 4 + atoms + bonds, table);
        return table;
    }
}
