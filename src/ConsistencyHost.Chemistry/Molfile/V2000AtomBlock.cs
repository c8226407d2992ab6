using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>V2000 atom block: xxxxx.xxxxyyyyy.yyyyzzzzz.zzzz aaaddccc (CTfile formats, MDL/BIOVIA).</summary>
internal static class V2000AtomBlock
{
    public static void Read(MolfileLines lines, int start, int count, MolfileTable table)
    {
        for (var k = 0; k < count; k++)
        {
            var i = start + k;
            if (i >= lines.Count)
            {
                lines.Error(Math.Min(i, lines.Count - 1), 1, MolfileMessages.Format(MolfileMessages.MissingAtomLine, k + 1, count));
                return;
            }

            table.Atoms.Add(ReadAtom(lines, i));
        }
    }

    private static MolfileAtom ReadAtom(MolfileLines lines, int i)
    {
        var x = lines.Real(i, 0, 10, "x");
        var y = lines.Real(i, 10, 10, "y");
        var z = lines.Real(i, 20, 10, "z");
        var symbol = MolfileLines.Field(lines[i], 31, 3);
        var element = ElementOf(symbol);
        if (element is null)
        {
            lines.Error(i, 32, MolfileMessages.Format(MolfileMessages.UnknownElement, symbol));
        }

        var massDifference = lines.Int(i, 34, 2, "mass difference");
        var chargeCode = lines.Int(i, 36, 3, "charge code");
        var (charge, radical) = chargeCode switch
        {
            1 => (3, 0),
            2 => (2, 0),
            3 => (1, 0),
            4 => (0, 1),
            5 => (-1, 0),
            6 => (-2, 0),
            7 => (-3, 0),
            _ => (0, 0),
        };
        var isotope = symbol switch
        {
            "D" => 2,
            "T" => 3,
            _ => massDifference != 0 && element is not null ? element.MostAbundantMassNumber + massDifference : 0,
        };
        return new MolfileAtom(symbol, element?.AtomicNumber ?? 0, x, y, z, charge, isotope, radical, lines.LineNumber(i));
    }

    /// <summary>Element of a symbol; D and T are read as hydrogen isotopes by the caller.</summary>
    public static Element? ElementOf(string symbol) => symbol switch
    {
        "D" or "T" => Elements.FromSymbol("H"),
        "R#" or "A" or "Q" or "*" or "L" => Elements.FromSymbol("*"),
        _ => Elements.FromSymbol(symbol),
    };
}
