namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

/// <summary>Classifies a group attached through carbon.</summary>
internal static class CarbonSubstituents
{
    /// <summary>The kind of the carbon group <paramref name="atom"/> attached to <paramref name="from"/>.</summary>
    public static Substituent Classify(PredictionContext context, int from, int atom)
    {
        if (context.IsAromatic(atom))
        {
            return AtomFacts.IsNextToPyridineNitrogen(context, atom) ? Substituent.AzinylCarbon : Substituent.Aryl;
        }

        var m = context.Molecule;
        var bonds = m.BondsOf(atom);
        var neighbours = m.Neighbours(atom);
        for (var k = 0; k < bonds.Length; k++)
        {
            if (neighbours[k] == from)
            {
                continue;
            }

            var order = m.Bonds[bonds[k]].Order;
            var element = m.Atoms[neighbours[k]].AtomicNumber;
            if (order == 3)
            {
                return element == 7 ? Substituent.Nitrile : Substituent.Alkynyl;
            }

            if (order == 2)
            {
                return element switch
                {
                    8 or 16 => Carbonyl(context, from, atom),
                    7 => Substituent.IminoCarbon,
                    6 => Substituent.Alkenyl,
                    _ => Substituent.Other,
                };
            }
        }

        return Saturated(context, from, atom);
    }

    private static Substituent Carbonyl(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        if (m.Atoms[atom].HydrogenCount > 0)
        {
            return Substituent.Formyl;
        }

        var bonds = m.BondsOf(atom);
        var neighbours = m.Neighbours(atom);
        for (var k = 0; k < bonds.Length; k++)
        {
            var n = neighbours[k];
            if (n == from || m.Bonds[bonds[k]].Order != 1)
            {
                continue;
            }

            var other = m.Atoms[n];
            switch (other.AtomicNumber)
            {
                case 8:
                    return other.Charge < 0 ? Substituent.Carboxylate : other.HydrogenCount > 0 ? Substituent.Carboxyl : Substituent.Ester;
                case 7:
                    return Substituent.AmideCarbon;
                case 9 or 17 or 35 or 53:
                    return Substituent.AcylHalide;
                case 6 when context.IsAromatic(n):
                    return Substituent.Aroyl;
            }
        }

        return Substituent.Acyl;
    }

    private static Substituent Saturated(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        int fluorine = 0, heavyHalogen = 0, oxygen = 0, nitrogen = 0, sulfur = 0, carbons = 0;
        bool aromatic = false, carbonyl = false;
        foreach (var n in m.Neighbours(atom))
        {
            if (n == from)
            {
                continue;
            }

            switch (m.Atoms[n].AtomicNumber)
            {
                case 9: fluorine++; break;
                case 17 or 35 or 53: heavyHalogen++; break;
                case 8: oxygen++; break;
                case 7: nitrogen++; break;
                case 16: sulfur++; break;
                case 6:
                    carbons++;
                    aromatic |= context.IsAromatic(n);
                    carbonyl |= AtomFacts.IsCarbonylCarbon(context, n) || AtomFacts.IsNitrileCarbon(context, n);
                    break;
            }
        }

        if (fluorine >= 2 || heavyHalogen >= 2) return Substituent.Trihalomethyl;
        if (fluorine + heavyHalogen > 0) return Substituent.HaloAlkyl;
        if (oxygen > 0) return Substituent.OxyAlkyl;
        if (nitrogen > 0) return Substituent.AminoAlkyl;
        if (sulfur > 0) return Substituent.ThioAlkyl;
        if (carbonyl) return Substituent.CarbonylAlkyl;
        if (aromatic) return Substituent.BenzylicAlkyl;
        return carbons >= 3 ? Substituent.TertiaryAlkyl : Substituent.Alkyl;
    }
}
