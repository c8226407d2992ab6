namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>Reads NMREDATA_ASSIGNMENT: "label, shift, atom[, atom…]" with atoms as numbers or H&lt;n&gt;.</summary>
internal static class AssignmentTagReader
{
    /// <summary>NMReDATA's marker for an unknown shift (tag format, Pupier et al. 2018).</summary>
    private const double UnknownShift = 777.777;

    public static List<NmredataAssignment> Read(List<LogicalLine> lines, int? atomCount, NmredataProblemSink sink)
    {
        var result = new List<NmredataAssignment>();
        foreach (var line in lines)
        {
            if (line.Text.StartsWith("Interchangeable=", StringComparison.OrdinalIgnoreCase)
                || line.Text.StartsWith("Equivalent=", StringComparison.OrdinalIgnoreCase)) continue;
            if (ReadLine(line, atomCount, sink) is { } assignment) result.Add(assignment);
        }
        return result;
    }

    private static NmredataAssignment? ReadLine(LogicalLine line, int? atomCount, NmredataProblemSink sink)
    {
        var fields = Fields.Split(line.Text);
        if (fields.Count < 3 || fields[0].Length == 0)
        {
            sink.Add(line.Line, line.Text, NmredataMessages.ExpectedAssignmentLine);
            return null;
        }
        if (!Fields.TryNumber(fields[1], out var shift))
        {
            sink.Add(line.Line, fields[1], NmredataMessages.ExpectedShift);
            return null;
        }
        var atoms = new List<NmredataAtom>();
        foreach (var field in fields.Skip(2))
        {
            if (Atom(field, atomCount) is not { } atom)
            {
                sink.Add(line.Line, field, NmredataMessages.ExpectedAtom);
                return null;
            }
            atoms.Add(atom);
        }
        return new NmredataAssignment(Fields.Unquote(fields[0]), Math.Abs(shift - UnknownShift) < 1e-9 ? null : shift, atoms, line.Line);
    }

    private static NmredataAtom? Atom(string field, int? atomCount)
    {
        var implicitH = field.StartsWith('H');
        if (!int.TryParse(implicitH ? field[1..] : field, out var number) || number < 1) return null;
        if (atomCount is { } count && number > count) return null;
        return new NmredataAtom(number, implicitH);
    }
}
