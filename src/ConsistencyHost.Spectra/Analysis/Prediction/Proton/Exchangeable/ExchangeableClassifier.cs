using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Exchangeable;

/// <summary>Names the class of the hydrogens on an O, N or S atom.</summary>
internal static class ExchangeableClassifier
{
    /// <summary>The class for H on <paramref name="atom"/>.</summary>
    public static ExchangeableKind Classify(PredictionContext context, int atom) => context.Molecule.Atoms[atom].AtomicNumber switch
    {
        8 => Oxygen(context, atom),
        7 => NitrogenExchangeables.Classify(context, atom),
        16 or 34 => IsOnAromatic(context, atom) ? ExchangeableKind.ArylThiol : ExchangeableKind.AlkylThiol,
        _ => ExchangeableKind.Other,
    };

    private static ExchangeableKind Oxygen(PredictionContext context, int atom)
    {
        var m = context.Molecule;
        if (m.Degree(atom) == 0)
        {
            return m.Atoms[atom].HydrogenCount == 2 && m.Atoms[atom].Charge == 0 ? ExchangeableKind.Water : ExchangeableKind.OtherOH;
        }

        var partner = m.Neighbours(atom)[0];
        return m.Atoms[partner].AtomicNumber switch
        {
            6 when AtomFacts.IsCarbonylCarbon(context, partner) => ExchangeableKind.CarboxylicOH,
            6 when context.IsAromatic(partner) => Chelation.HasAcceptorNextTo(context, partner) ? ExchangeableKind.ChelatedOH : ExchangeableKind.PhenolOH,
            6 when AtomFacts.DoubleBondsTo(context, partner, 6) > 0 => Chelation.HasAcceptorNextTo(context, partner) ? ExchangeableKind.ChelatedOH : ExchangeableKind.PhenolOH,
            6 when AtomFacts.DoubleBondsTo(context, partner, 7) > 0 => ExchangeableKind.OtherOH,
            6 => ExchangeableKind.AlcoholOH,
            7 => ExchangeableKind.OximeOH,
            5 => ExchangeableKind.BoronicOH,
            _ => ExchangeableKind.OtherOH,
        };
    }

    /// <summary>True when the atom has an aromatic neighbour.</summary>
    internal static bool IsOnAromatic(PredictionContext context, int atom)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (context.IsAromatic(n)) return true;
        }

        return false;
    }
}
