namespace ConsistencyHost.Spectra.Analysis.Prediction;

/// <summary>
/// Where a chemical shift is expected, in ppm: a plausible range and the most likely value inside it. A reported
/// shift inside the range is unremarkable; the further outside, the less plausible.
/// </summary>
/// <param name="Low">Lowest plausible shift.</param>
/// <param name="High">Highest plausible shift.</param>
/// <param name="MostLikely">The estimate the range was built around (Low ≤ MostLikely ≤ High).</param>
public readonly record struct ShiftWindow(double Low, double High, double MostLikely)
{
    /// <summary>A window of ± <paramref name="halfWidth"/> around <paramref name="estimate"/>.</summary>
    public static ShiftWindow Around(double estimate, double halfWidth) => new(estimate - halfWidth, estimate + halfWidth, estimate);

    /// <summary>High − Low.</summary>
    public double Width => High - Low;

    /// <summary>True when <paramref name="ppm"/> lies inside the window (ends included).</summary>
    public bool Contains(double ppm) => ppm >= Low && ppm <= High;

    /// <summary>How far <paramref name="ppm"/> lies outside the window; 0 inside.</summary>
    public double DistanceOutside(double ppm) => ppm < Low ? Low - ppm : ppm > High ? ppm - High : 0;

    /// <summary>How far a reported range lies outside the window; 0 when the two overlap.</summary>
    public double DistanceOutside(double low, double high) => high < Low ? Low - high : low > High ? low - High : 0;

    /// <summary>The window widened by <paramref name="ppm"/> on both sides.</summary>
    public ShiftWindow Widened(double ppm) => new(Low - ppm, High + ppm, MostLikely);

    /// <summary>The smallest window holding both.</summary>
    public ShiftWindow Union(ShiftWindow other) =>
        new(Math.Min(Low, other.Low), Math.Max(High, other.High), (MostLikely + other.MostLikely) / 2);
}
