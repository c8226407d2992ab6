namespace ConsistencyHost.Sdk.Findings;

/// <summary>A reference to one signal of one spectrum of the entry (both 0-based, in entry order).</summary>
/// <param name="Spectrum">Index into <see cref="Entries.IEntryView.Spectra"/>.</param>
/// <param name="Signal">Index into that spectrum's signals; -1 for the spectrum as a whole.</param>
public readonly record struct PeakRef(int Spectrum, int Signal)
{
    /// <summary>A reference to a whole spectrum rather than one of its signals.</summary>
    public static PeakRef WholeSpectrum(int spectrum) => new(spectrum, -1);
}
