namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>V2000 properties block: M  CHG, M  ISO, M  RAD up to M  END. Any CHG or RAD line supersedes the
/// charges and radicals of the atom block (CTfile rule).</summary>
internal static class V2000PropertiesBlock
{
    /// <summary>Reads properties from <paramref name="start"/>; returns the index after M  END (or the end).</summary>
    public static int Read(MolfileLines lines, int start, MolfileTable table)
    {
        var reset = false;
        for (var i = start; i < lines.Count; i++)
        {
            var line = lines[i];
            if (line.StartsWith("M  END", StringComparison.Ordinal))
            {
                return i + 1;
            }

            if (line.StartsWith("$$$$", StringComparison.Ordinal))
            {
                break;
            }

            var tag = line.Length >= 6 ? line[..6] : line;
            if (tag is "M  CHG" or "M  RAD" or "M  ISO")
            {
                if (!reset && tag != "M  ISO")
                {
                    foreach (var a in table.Atoms)
                    {
                        a.Charge = 0;
                        a.Radical = 0;
                    }

                    reset = true;
                }

                ReadPairs(lines, i, tag, table);
            }
        }

        lines.Warning(Math.Max(0, lines.Count - 1), 1, MolfileMessages.MissingEnd);
        return lines.Count;
    }

    private static void ReadPairs(MolfileLines lines, int i, string tag, MolfileTable table)
    {
        var n = lines.Int(i, 6, 3, "entry count", -1);
        if (n is < 1 or > 8 || lines[i].TrimEnd().Length < 9 + (n * 8))
        {
            lines.Error(i, 7, MolfileMessages.Format(MolfileMessages.BadPropertyLine, lines[i].TrimEnd()));
            return;
        }

        for (var k = 0; k < n; k++)
        {
            var atom = lines.Int(i, 9 + (k * 8), 4, "atom number");
            var value = lines.Int(i, 13 + (k * 8), 4, "value");
            if (atom < 1 || atom > table.Atoms.Count)
            {
                lines.Error(i, 10 + (k * 8), MolfileMessages.Format(MolfileMessages.BadAtomReference, atom, table.Atoms.Count));
                continue;
            }

            var a = table.Atoms[atom - 1];
            switch (tag)
            {
                case "M  CHG":
                    a.Charge = MolfileAtomCheck.Charge(lines, i, 14 + (k * 8), value);
                    break;
                case "M  ISO":
                    a.Isotope = MolfileAtomCheck.MassNumber(lines, i, 14 + (k * 8), value);
                    break;
                default:
                    a.Radical = value == 2 ? 1 : value is 1 or 3 ? 2 : 0;
                    break;
            }
        }
    }
}
