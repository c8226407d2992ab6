namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon;

/// <summary>
/// Predicted 13C shift windows for one carbon. This first version gives environment-type windows only (the coarse
/// layer every finer method falls back to).
/// </summary>
/// <remarks>
/// Ranges: common practice, as in the 13C chemical-shift charts of organic spectroscopy textbooks (e.g. Pretsch,
/// Bühlmann, Badertscher, Structure Determination of Organic Compounds, 4th ed., 2009, 13C overview chart; from
/// memory).
/// </remarks>
public static class CarbonShifts
{
    /// <summary>The window for <paramref name="carbon"/> in <paramref name="solvent"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, string? solvent)
    {
        ArgumentNullException.ThrowIfNull(context);
        var m = context.Molecule;
        if (context.IsAromatic(carbon)) return Fallback(95, 170, 128, "aromatic carbon");
        foreach (var bond in m.BondsOf(carbon))
        {
            var b = m.Bonds[bond];
            var other = m.Atoms[b.Other(carbon)].AtomicNumber;
            if (b.Order == 3) return other == 7 ? Fallback(105, 125, 118, "nitrile carbon") : Fallback(60, 100, 80, "alkyne carbon");
            if (b.Order == 2 && other is 8 or 16) return Fallback(150, 235, 180, "carbonyl or thiocarbonyl carbon");
            if (b.Order == 2) return Fallback(95, 175, 130, "alkene or imine carbon");
        }

        return Fallback(-10, 110, 35, "sp3 carbon");
    }

    private static ShiftPrediction Fallback(double low, double high, double likely, string reason) =>
        new(new ShiftWindow(low, high, likely), ShiftBasis.EnvironmentFallback, [reason]);
}
