using System.Globalization;

namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>V3000 connection table: "M  V30" lines (with '-' continuation) between BEGIN CTAB and END CTAB.</summary>
internal static class V3000Ctab
{
    private const string Prefix = "M  V30 ";

    /// <summary>Reads from the line after the counts line; returns the index after M  END.</summary>
    public static int Read(MolfileLines lines, int start, MolfileTable table)
    {
        var ids = new Dictionary<int, int>();
        var section = string.Empty;
        var i = start;
        while (i < lines.Count)
        {
            if (lines[i].StartsWith("M  END", StringComparison.Ordinal))
            {
                return i + 1;
            }

            var lineIndex = i;
            var text = Logical(lines, ref i);
            if (text is null)
            {
                continue;
            }

            if (text.StartsWith("BEGIN ", StringComparison.Ordinal) || text.StartsWith("END ", StringComparison.Ordinal))
            {
                section = text.StartsWith("BEGIN ", StringComparison.Ordinal) ? text[6..].Trim() : string.Empty;
                continue;
            }

            if (section == "ATOM")
            {
                ReadAtom(lines, lineIndex, text, table, ids);
            }
            else if (section == "BOND")
            {
                ReadBond(lines, lineIndex, text, table, ids);
            }
        }

        lines.Warning(Math.Max(0, lines.Count - 1), 1, MolfileMessages.MissingEnd);
        return lines.Count;
    }

    /// <summary>Joins continuation lines; null for lines that are not V30 lines.</summary>
    private static string? Logical(MolfileLines lines, ref int i)
    {
        if (!lines[i].StartsWith(Prefix, StringComparison.Ordinal))
        {
            i++;
            return null;
        }

        var text = lines[i][Prefix.Length..].TrimEnd();
        i++;
        while (text.EndsWith('-') && i < lines.Count && lines[i].StartsWith(Prefix, StringComparison.Ordinal))
        {
            text = text[..^1] + lines[i][Prefix.Length..].TrimEnd();
            i++;
        }

        return text;
    }

    private static void ReadAtom(MolfileLines lines, int i, string text, MolfileTable table, Dictionary<int, int> ids)
    {
        var f = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (f.Length < 6 || !int.TryParse(f[0], CultureInfo.InvariantCulture, out var id)
            || !TryReal(f[2], out var x) || !TryReal(f[3], out var y) || !TryReal(f[4], out var z))
        {
            lines.Error(i, 1, MolfileMessages.Format(MolfileMessages.BadV3000Line, "expected 'index type x y z aamap' for an atom"));
            return;
        }

        var element = V2000AtomBlock.ElementOf(f[1]);
        if (element is null)
        {
            lines.Error(i, 1, MolfileMessages.Format(MolfileMessages.UnknownElement, f[1]));
        }

        var charge = MolfileAtomCheck.Charge(lines, i, 1, Property(f, "CHG="));
        var radical = Property(f, "RAD=");
        var isotope = f[1] switch { "D" => 2, "T" => 3, _ => MolfileAtomCheck.MassNumber(lines, i, 1, Property(f, "MASS=")) };
        ids[id] = table.Atoms.Count;
        table.Atoms.Add(new MolfileAtom(f[1], element?.AtomicNumber ?? 0, x, y, z, charge,
            isotope, radical == 2 ? 1 : radical is 1 or 3 ? 2 : 0, lines.LineNumber(i)));
    }

    private static void ReadBond(MolfileLines lines, int i, string text, MolfileTable table, Dictionary<int, int> ids)
    {
        var f = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (f.Length < 4 || !int.TryParse(f[1], CultureInfo.InvariantCulture, out var type)
            || !int.TryParse(f[2], CultureInfo.InvariantCulture, out var a) || !int.TryParse(f[3], CultureInfo.InvariantCulture, out var b))
        {
            lines.Error(i, 1, MolfileMessages.Format(MolfileMessages.BadV3000Line, "expected 'index type atom1 atom2' for a bond"));
            return;
        }

        var ia = ids.TryGetValue(a, out var pa) ? pa + 1 : -1;
        var ib = ids.TryGetValue(b, out var pb) ? pb + 1 : -1;
        // An id no atom line declared is reported as written (a shifted stand-in for it could land in range).
        if (ia < 0 || ib < 0)
        {
            lines.Error(i, 1, MolfileMessages.Format(MolfileMessages.BadAtomReference, ia < 0 ? a : b, table.Atoms.Count));
            return;
        }

        if (!MolfileBondCheck.Valid(lines, i, ia, ib, type, table))
        {
            return;
        }

        var stereo = Property(f, "CFG=") switch { 1 => 1, 2 => type == 2 ? 3 : 4, 3 => 6, _ => 0 };
        table.Bonds.Add(new MolfileBond(ia - 1, ib - 1, type is >= 1 and <= 4 ? type : 1, stereo, lines.LineNumber(i)));
    }

    private static int Property(string[] fields, string key)
    {
        foreach (var f in fields)
        {
            if (f.StartsWith(key, StringComparison.Ordinal) && int.TryParse(f.AsSpan(key.Length), CultureInfo.InvariantCulture, out var v))
            {
                return v;
            }
        }

        return 0;
    }

    private static bool TryReal(string s, out double value) =>
        double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);
}
