namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>V2000 bond block: 111222tttsss.</summary>
internal static class V2000BondBlock
{
    public static void Read(MolfileLines lines, int start, int count, MolfileTable table)
    {
        for (var k = 0; k < count; k++)
        {
            var i = start + k;
            if (i >= lines.Count)
            {
                lines.Error(Math.Min(i, lines.Count - 1), 1, MolfileMessages.Format(MolfileMessages.MissingBondLine, k + 1, count));
                return;
            }

            var a = lines.Int(i, 0, 3, "first atom");
            var b = lines.Int(i, 3, 3, "second atom");
            var type = lines.Int(i, 6, 3, "bond type", 1);
            var stereo = lines.Int(i, 9, 3, "bond stereo");
            if (MolfileBondCheck.Valid(lines, i, a, b, type, table))
            {
                table.Bonds.Add(new MolfileBond(a - 1, b - 1, type is >= 1 and <= 4 ? type : 1, stereo, lines.LineNumber(i)));
            }
        }
    }
}

/// <summary>Checks shared by the V2000 and V3000 bond readers.</summary>
internal static class MolfileBondCheck
{
    public static bool Valid(MolfileLines lines, int i, int a, int b, int type, MolfileTable table)
    {
        var atomCount = table.Atoms.Count;
        if (a < 1 || a > atomCount || b < 1 || b > atomCount)
        {
            lines.Error(i, 1, MolfileMessages.Format(MolfileMessages.BadAtomReference, a < 1 || a > atomCount ? a : b, atomCount));
            return false;
        }

        if (a == b)
        {
            lines.Error(i, 1, MolfileMessages.Format(MolfileMessages.SelfBond, a));
            return false;
        }

        // A second bond between one pair would make a multigraph that no later step (or SMILES) can express.
        if (!table.JoinedPairs.TryAdd((Math.Min(a, b), Math.Max(a, b)), lines.LineNumber(i)))
        {
            lines.Error(i, 1, MolfileMessages.Format(MolfileMessages.DuplicateBond, Math.Min(a, b), Math.Max(a, b), table.JoinedPairs[(Math.Min(a, b), Math.Max(a, b))]));
            return false;
        }

        if (type is < 1 or > 4)
        {
            lines.Warning(i, 7, MolfileMessages.Format(MolfileMessages.UnsupportedBondType, type));
        }

        return true;
    }
}
