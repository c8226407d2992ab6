using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>
/// Classifies the carbon side of a carbonyl-type carbon and adds the corrections for what sits on an sp3 side carbon
/// (α-halogen, α-oxygen, α-nitrogen, α-carbonyl …).
/// </summary>
/// <remarks>
/// α corrections (ppm), from memory, read off esters against their parent (Pretsch et al. 2009): α-Cl/Br −6.8
/// (ethyl chloroacetate 167.3 vs 174.1), α-F −6, α-OH −0.8 (methyl lactate), α-OR −3.3 (methyl methoxyacetate),
/// α-OC(O) −5.5, α-NH2 0, α-NR −2.5, α-NC(O) −3.2 (Boc-Gly-OMe 170.6), α-N3 −5.5, α-NO2 −12, α-S −3.8, α-SO2 −9,
/// α-P −8, α-CN −11 (ethyl cyanoacetate 163.0), α-C(O) −7.1 (diethyl malonate 166.8), α-aryl −2.1 (methyl
/// phenylacetate 172.0), α-vinyl −2.0, α-alkynyl −3.0. The same terms serve ketones, acids and amides with a wider
/// window (their spread across families is ±2).
/// </remarks>
internal static class CarbonylSide
{
    /// <summary>The kind of the side starting at <paramref name="side"/> on carbon <paramref name="center"/>.</summary>
    public static SideKind Classify(PredictionContext context, int center, int side)
    {
        var m = context.Molecule;
        if (m.Atoms[side].AtomicNumber != Topology.Carbon)
        {
            return SideKind.Other;
        }

        if (context.IsAromatic(side))
        {
            var facts = Aromatic.AromaticFacts.Of(context);
            return !facts.RingHasHetero[side] ? SideKind.Aryl
                : facts.RingSize[side] == 5 ? SideKind.FiveRingHeteroaryl : SideKind.SixRingHeteroaryl;
        }

        if (Topology.IsSp3Carbon(context, side))
        {
            if (Topology.CountNeighbours(m, side, 9) >= 2)
            {
                return SideKind.Perfluoroalkyl;
            }

            return m.Atoms[side].HydrogenCount == 3 ? SideKind.Methyl : (m.Degree(side) - 1) switch
            {
                1 => SideKind.Primary,
                2 => SideKind.Secondary,
                _ => SideKind.Tertiary,
            };
        }

        return GroupClassifier.Classify(context, center, side) switch
        {
            Group.Vinyl => SideKind.Vinyl,
            Group.Alkynyl => SideKind.Alkynyl,
            Group.Formyl or Group.Acyl or Group.CarboxylicAcid or Group.Ester or Group.Amide or Group.AcylHalide => SideKind.Acyl,
            _ => SideKind.Other,
        };
    }

    /// <summary>Adds α corrections for the substituents on sp3 side carbon <paramref name="side"/>; returns their count.</summary>
    public static int AddAlphaTerms(PredictionContext context, int center, int side, CarbonEstimate estimate)
    {
        var count = 0;
        foreach (var x in context.Molecule.Neighbours(side))
        {
            if (x == center || Topology.IsSp3Carbon(context, x))
            {
                continue;
            }

            var group = GroupClassifier.Classify(context, side, x);
            var value = Alpha(group);
            if (value != 0)
            {
                estimate.Add(AlphaLabels[(int)group], value);
                count++;
            }
        }

        return count;
    }

    private static readonly string[] AlphaLabels = GroupNames.Prefixed("α");

    private static double Alpha(Group group) => group switch
    {
        Group.Chloro or Group.Bromo or Group.Iodo => -6.8,
        Group.Fluoro => -6.0,
        Group.Hydroxy or Group.Silyloxy => -0.8,
        Group.Alkoxy or Group.Aryloxy => -3.3,
        Group.Acyloxy or Group.Sulfonyloxy => -5.5,
        Group.AlkylAmino or Group.DialkylAmino or Group.Ammonium => -2.5,
        Group.Amido or Group.DialkylAmido or Group.Sulfonamido or Group.AzoleNitrogen => -3.2,
        Group.Azido => -5.5,
        Group.Nitro => -12.0,
        Group.Sulfide or Group.Thiol => -3.8,
        Group.Sulfinyl or Group.Sulfonyl => -9.0,
        Group.Phosphorus => -8.0,
        Group.Nitrile => -11.0,
        Group.Formyl or Group.Acyl or Group.CarboxylicAcid or Group.Ester or Group.Amide or Group.AcylHalide or Group.Carboxylate => -7.1,
        Group.Aryl => -2.1,
        Group.Vinyl => -2.0,
        Group.Alkynyl => -3.0,
        _ => 0,
    };
}
