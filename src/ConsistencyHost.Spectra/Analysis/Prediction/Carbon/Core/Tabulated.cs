namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>A tabulated value for a whole environment: the most likely shift, its half-width and what it is.</summary>
internal readonly record struct Tabulated(double Ppm, double HalfWidth, string Label)
{
    /// <summary>True when the row holds a value.</summary>
    public bool Found => Label is not null;

    /// <summary>The prediction this row gives.</summary>
    public ShiftPrediction ToPrediction(string widthReason = "tabulated range") =>
        ToEstimate().Build(ShiftBasis.TabulatedEnvironment, widthReason);

    /// <summary>An estimate that later steps may adjust.</summary>
    public CarbonEstimate ToEstimate()
    {
        var estimate = new CarbonEstimate().Base(Label, Ppm);
        estimate.Widen(HalfWidth);
        return estimate;
    }
}
