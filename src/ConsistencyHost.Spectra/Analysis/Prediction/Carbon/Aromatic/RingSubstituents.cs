using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>Picks the benzene increment row for substituent atom <c>x</c> on ring atom <c>ring</c>.</summary>
internal static class RingSubstituents
{
    /// <summary>The row for the substituent starting at <paramref name="x"/>.</summary>
    public static RingIncrement Of(PredictionContext context, int ring, int x)
    {
        var m = context.Molecule;
        var group = GroupClassifier.Classify(context, ring, x);
        return group switch
        {
            Group.Alkyl => AlkylRow(context, ring, x),
            Group.Trifluoromethyl => BenzeneIncrements.Trifluoromethyl,
            Group.Aryl => AromaticFacts.Of(context).IsFiveRingHeteroaryl(x) ? BenzeneIncrements.FiveRingHeteroaryl : BenzeneIncrements.Aryl,
            Group.Vinyl => BenzeneIncrements.Vinyl,
            Group.Alkynyl => BenzeneIncrements.Alkynyl,
            Group.Formyl => BenzeneIncrements.Formyl,
            Group.Acyl or Group.Thioacyl => BenzeneIncrements.Acyl,
            Group.CarboxylicAcid => BenzeneIncrements.CarboxylicAcid,
            Group.Carboxylate => BenzeneIncrements.Carboxylate,
            Group.Ester => BenzeneIncrements.Ester,
            Group.Amide => BenzeneIncrements.Amide,
            Group.AcylHalide => BenzeneIncrements.AcylHalide,
            Group.Nitrile => BenzeneIncrements.Nitrile,
            Group.Imidoyl => BenzeneIncrements.Imidoyl,
            Group.Hydroxy => BenzeneIncrements.Hydroxy,
            Group.Alkoxide => BenzeneIncrements.Oxide,
            Group.Alkoxy or Group.Silyloxy => BenzeneIncrements.Alkoxy,
            Group.Aryloxy => BenzeneIncrements.Aryloxy,
            Group.Acyloxy => BenzeneIncrements.Acyloxy,
            Group.Sulfonyloxy => BenzeneIncrements.Sulfonyloxy,
            Group.Amino => BenzeneIncrements.Amino,
            Group.AlkylAmino => BenzeneIncrements.AlkylAmino,
            Group.DialkylAmino => BenzeneIncrements.DialkylAmino,
            Group.Amido => BenzeneIncrements.Acetamido,
            Group.DialkylAmido => BenzeneIncrements.TertiaryAmido,
            Group.Sulfonamido => BenzeneIncrements.Sulfonamido,
            Group.AzoleNitrogen => BenzeneIncrements.AzoleNitrogen,
            Group.IminoNitrogen => BenzeneIncrements.Imino,
            Group.Azido => BenzeneIncrements.Azido,
            Group.Ammonium => BenzeneIncrements.Ammonium,
            Group.Nitro => BenzeneIncrements.Nitro,
            Group.Thiol => BenzeneIncrements.Thiol,
            Group.Sulfide => BenzeneIncrements.Sulfide,
            Group.Sulfinyl => BenzeneIncrements.Sulfinyl,
            Group.Sulfonyl => SulfonylRow(m, ring, x),
            Group.Fluoro => BenzeneIncrements.Fluoro,
            Group.Chloro => BenzeneIncrements.Chloro,
            Group.Bromo => BenzeneIncrements.Bromo,
            Group.Iodo => BenzeneIncrements.Iodo,
            Group.Silyl => BenzeneIncrements.Silyl,
            Group.Boron => BenzeneIncrements.Boryl,
            Group.Phosphorus => BenzeneIncrements.Phosphorus,
            _ => BenzeneIncrements.Other,
        };
    }

    private static RingIncrement AlkylRow(PredictionContext context, int ring, int x)
    {
        var m = context.Molecule;
        if (m.Atoms[x].HydrogenCount == 3)
        {
            return BenzeneIncrements.Methyl;
        }

        RingIncrement? functional = null;
        var others = 0;
        foreach (var y in m.Neighbours(x))
        {
            if (y == ring)
            {
                continue;
            }

            others++;
            functional ??= FunctionalRow(context, x, y);
        }

        return functional is { } row ? BenzeneIncrements.Branched(row, others - 1)
            : others switch { <= 1 => BenzeneIncrements.PrimaryAlkyl, 2 => BenzeneIncrements.SecondaryAlkyl, _ => BenzeneIncrements.TertiaryAlkyl };
    }

    /// <summary>The CH2X row when benzylic neighbour <paramref name="y"/> is a heteroatom or an unsaturated carbon; else null.</summary>
    private static RingIncrement? FunctionalRow(PredictionContext context, int benzylic, int y)
    {
        var m = context.Molecule;
        var z = m.Atoms[y].AtomicNumber;
        return z switch
        {
            Topology.Oxygen => GroupClassifier.Classify(context, benzylic, y) switch
            {
                Group.Hydroxy or Group.Alkoxide or Group.Silyloxy => BenzeneIncrements.OxyMethyl,
                Group.Acyloxy or Group.Sulfonyloxy => BenzeneIncrements.EsterMethyl,
                _ => BenzeneIncrements.EtherMethyl,
            },
            Topology.Nitrogen => GroupClassifier.Classify(context, benzylic, y) switch
            {
                Group.Amino => BenzeneIncrements.AminoMethyl,
                Group.AlkylAmino or Group.DialkylAmino or Group.Ammonium => BenzeneIncrements.AlkylAminoMethyl,
                _ => BenzeneIncrements.AmidoMethyl,
            },
            Topology.Sulfur or 9 or 17 or 35 or 53 => BenzeneIncrements.HaloMethyl,
            Topology.Carbon when Topology.IsSp3Carbon(context, y) => null,
            Topology.Carbon => context.IsAromatic(y) || Topology.PartnerByOrder(m, y, 2, Topology.Carbon) >= 0
                ? BenzeneIncrements.ArylMethyl : BenzeneIncrements.AcylMethyl,
            _ => null,
        };
    }

    private static RingIncrement SulfonylRow(Chemistry.Model.Molecule m, int ring, int sulfur)
    {
        foreach (var y in m.Neighbours(sulfur))
        {
            if (y != ring && m.Atoms[y].AtomicNumber != Topology.Carbon && m.Bonds[m.BondBetween(sulfur, y)].Order == 1)
            {
                return BenzeneIncrements.SulfonylHetero;
            }
        }

        return BenzeneIncrements.Sulfonyl;
    }
}
