namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

/// <summary>Classifies a group attached through oxygen.</summary>
internal static class OxygenSubstituents
{
    /// <summary>The kind of the oxygen group <paramref name="atom"/> attached to <paramref name="from"/>.</summary>
    public static Substituent Classify(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        if (m.Atoms[atom].Charge < 0)
        {
            return Substituent.Oxide;
        }

        foreach (var n in m.Neighbours(atom))
        {
            if (n != from)
            {
                return ByPartner(context, atom, n);
            }
        }

        return m.Atoms[atom].HydrogenCount > 0 ? Substituent.Hydroxyl : Substituent.Other;
    }

    private static Substituent ByPartner(PredictionContext context, int oxygen, int partner)
    {
        var m = context.Molecule;
        switch (m.Atoms[partner].AtomicNumber)
        {
            case 6 when AtomFacts.IsCarbonylCarbon(context, partner) || AtomFacts.DoubleBondsTo(context, partner, 7) > 0:
                return HasConjugatedNeighbour(context, partner, oxygen) ? Substituent.Aroyloxy : Substituent.Acyloxy;
            case 6 when context.IsAromatic(partner):
                return Substituent.Aryloxy;
            case 6 when AtomFacts.DoubleBondsTo(context, partner, 6) > 0:
                return Substituent.VinylOxy;
            case 6 or 14:
                return Substituent.Alkoxy;
            case 16 when AtomFacts.DoubleBondsTo(context, partner, 8) >= 2:
                return Substituent.Sulfonyloxy;
            default:
                return Substituent.HeteroOxy;
        }
    }

    private static bool HasConjugatedNeighbour(PredictionContext context, int atom, int except)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (n != except && AtomFacts.IsPiCarbon(context, n))
            {
                return true;
            }
        }

        return false;
    }
}
