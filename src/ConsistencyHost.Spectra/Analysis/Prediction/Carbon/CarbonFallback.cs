using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon;

/// <summary>Environment-type windows for carbons no table covers (charged or radical carbons, unusual bonding).</summary>
/// <remarks>
/// Ranges: common practice, as in the 13C chemical-shift charts of organic spectroscopy textbooks (e.g. Pretsch,
/// Bühlmann, Badertscher, Structure Determination of Organic Compounds, 4th ed., 2009, 13C overview chart; from
/// memory).
/// </remarks>
internal static class CarbonFallback
{
    /// <summary>The environment-type window for <paramref name="carbon"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon)
    {
        var m = context.Molecule;
        foreach (var bond in m.BondsOf(carbon))
        {
            var b = m.Bonds[bond];
            var other = m.Atoms[b.Other(carbon)].AtomicNumber;
            if (b.Order == 3)
            {
                return Window(60, 125, 85, "sp carbon");
            }

            if (b.Order == 2)
            {
                return other is Topology.Oxygen or Topology.Sulfur ? Window(150, 240, 185, "C=O/C=S carbon") : Window(80, 200, 135, "sp2 carbon");
            }
        }

        return Window(-30, 120, 40, "sp3 carbon");
    }

    private static ShiftPrediction Window(double low, double high, double likely, string reason) =>
        new(new ShiftWindow(low, high, likely), ShiftBasis.EnvironmentFallback, [reason + " (environment range)"]);
}
