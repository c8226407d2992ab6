namespace ConsistencyHost.Spectra.Reported;

/// <summary>Limits that keep one request from costing unbounded time or memory.</summary>
public sealed record ReportedTextOptions
{
    /// <summary>200,000 characters and 2,000 signals per spectrum: far above any experimental section.</summary>
    public static ReportedTextOptions Default { get; } = new();

    /// <summary>Longest text accepted, in characters.</summary>
    public int MaxTextLength { get; init; } = 200_000;

    /// <summary>Most signals accepted in one spectrum.</summary>
    public int MaxSignalsPerSpectrum { get; init; } = 2_000;
}
