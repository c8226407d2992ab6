namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>
/// Wide environment-type windows for hydrogens no increment system covers: the coarse layer every finer method falls
/// back to (H on B, Si, P and metals; allenes; charged or radical carbons; unusual double bonds).
/// </summary>
/// <remarks>Ranges: common practice, as in the 1H overview charts of Pretsch, Bühlmann &amp; Badertscher, Structure
/// Determination of Organic Compounds, Springer 2009 (from memory): allene H 4.4–5.6, Si–H 3.5–5.0, P–H 3–9 (with
/// its large 1J), B–H broad 0–5, metal hydrides far upfield.</remarks>
internal static class EnvironmentWindows
{
    /// <summary>A fallback window with one reason.</summary>
    public static ShiftPrediction Window(double low, double high, double likely, string reason)
    {
        var estimate = new ProtonEstimate().Start(likely, reason + " (environment range)");
        estimate.Cover(low, "range from");
        estimate.Cover(high, "range to");
        return estimate.Finish(ShiftBasis.EnvironmentFallback);
    }

    /// <summary>H on an element other than C, N, O, S.</summary>
    public static ShiftPrediction OnOtherElement(int atomicNumber) => atomicNumber switch
    {
        14 => Window(3.3, 5.2, 4.2, "Si–H"),
        15 => Window(2.5, 9.5, 6.0, "P–H"),
        5 => Window(-1.0, 5.5, 2.0, "B–H"),
        1 => Window(4.0, 5.0, 4.6, "H2"),
        _ => Window(-30.0, 12.0, 0.0, "H on " + atomicNumber.ToString(System.Globalization.CultureInfo.InvariantCulture) + " (metal or unusual element)"),
    };

    /// <summary>sp3 C–H that is charged or radical; unusual double bonds; anything not classified.</summary>
    public static ShiftPrediction UnclassifiedCarbon(string what) => Window(0.0, 10.5, 4.0, what);

    /// <summary>Allenic C–H.</summary>
    public static ShiftPrediction Allene() => Window(4.3, 5.7, 4.8, "allene C–H");
}
