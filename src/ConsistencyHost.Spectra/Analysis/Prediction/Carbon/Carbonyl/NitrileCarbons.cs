using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>Nitrile, isonitrile, cyanamide, cyanate and thiocyanate carbons.</summary>
/// <remarks>
/// From memory (Pretsch et al. 2009): acetonitrile 116.4 (Gottlieb 1997: 116.43; DMSO-d6 117.91), butyronitrile
/// 119.8, isobutyronitrile 123.7, pivalonitrile 125.0, benzonitrile 118.8, thiophene-2-carbonitrile 114.1,
/// 3-cyanopyridine 116.5, acrylonitrile 117.5, propiolonitrile 105, acyl cyanides 113.5, α-substituents as for
/// esters (ethyl cyanoacetate CN 113.0); cyanamides 114–119, cyanates 108–110, thiocyanates 110–113;
/// isonitriles 153–166 (often a 1:1:1 triplet, 1J(13C,14N) ≈ 5 Hz).
/// </remarks>
internal static class NitrileCarbons
{
    private static readonly CarbonylSideTable Sides = new("nitrile C≡N", 116.9,
        [2.9, 5.9, 7.6, 1.8, -2.5, 0.0, 0.6, -12.0, -3.4, -3.0, 0.0], 2.5);

    /// <summary>The window of carbon <paramref name="carbon"/> triple-bonded to nitrogen <paramref name="nitrogen"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int nitrogen)
    {
        var m = context.Molecule;
        var side = -1;
        foreach (var x in m.Neighbours(carbon))
        {
            side = x != nitrogen ? x : side;
        }

        if (side < 0)
        {
            return m.Degree(nitrogen) > 1 ? new Tabulated(158.5, 7.5, "isonitrile C").ToPrediction() : new Tabulated(112.0, 6.0, "cyanide C").ToPrediction();
        }

        var row = m.Atoms[side].AtomicNumber switch
        {
            Topology.Carbon => default(Tabulated),
            Topology.Nitrogen => new Tabulated(116.0, 4.0, "cyanamide N–C≡N"),
            Topology.Oxygen => new Tabulated(109.0, 3.0, "cyanate O–C≡N"),
            Topology.Sulfur => new Tabulated(111.5, 2.8, "thiocyanate S–C≡N"),
            14 => new Tabulated(126.0, 5.0, "silyl cyanide"),
            _ => new Tabulated(100.0, 25.0, "X–C≡N"),
        };
        if (row.Found)
        {
            return row.ToPrediction();
        }

        var estimate = CarbonylCarbons.Sides(context, carbon, Sides, side, -1);
        return estimate.Build(ShiftBasis.TabulatedEnvironment, "type range and side");
    }
}
