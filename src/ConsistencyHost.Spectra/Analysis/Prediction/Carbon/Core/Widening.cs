namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>Widens a finished prediction and appends the reason ("±0.8: DMSO-d6").</summary>
internal static class Widening
{
    /// <summary><paramref name="prediction"/> widened by <paramref name="ppm"/> on both sides, saying why.</summary>
    public static ShiftPrediction Apply(ShiftPrediction prediction, double ppm, string why)
    {
        if (ppm <= 0)
        {
            return prediction;
        }

        var term = new ReasonTerm(ReasonKind.HalfWidth, why, 0, ppm);
        IReadOnlyList<string> reasons = prediction.Reasons is ReasonList list ? list.With(term) : [.. prediction.Reasons, term.Format()];
        return prediction with { Window = prediction.Window.Widened(ppm), Reasons = reasons };
    }
}
