using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>
/// Routes an sp3 carbon to its method: fluorinated (CF3/CF2) and polyheteroatom carbons and methyls on
/// heteroatoms or π systems are tabulated; everything else is summed by increments.
/// </summary>
internal static class Sp3Carbons
{
    /// <summary>The window of sp3 carbon <paramref name="carbon"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon)
    {
        var m = context.Molecule;
        var count = HeteroCount.Of(context, carbon);
        if (count.F >= 2)
        {
            return FluorinatedCarbons.Predict(context, carbon, count);
        }

        if (count.Total >= 2 && PolyheteroCarbons.Lookup(context, carbon, count) is { Found: true } poly)
        {
            return poly.ToPrediction();
        }

        if (m.Degree(carbon) == 1 && m.Atoms[carbon].HydrogenCount == 3)
        {
            var x = m.Neighbours(carbon)[0];
            if (!Topology.IsSp3Carbon(context, x) && MethylCarbons.Lookup(context, carbon, x) is { Found: true } methyl)
            {
                return methyl.ToPrediction();
            }
        }

        var sum = Sp3Increments.Predict(context, carbon);
        return count.F == 1 ? Widening.Apply(sum, 0.9, "more for C–F doublet lines (¹J ≈ 170 Hz)") : sum;
    }
}
