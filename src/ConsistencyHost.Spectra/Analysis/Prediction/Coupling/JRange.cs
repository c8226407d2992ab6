namespace ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

/// <summary>The expected size of one coupling type, as |J| in hertz.</summary>
/// <param name="LowHz">Smallest |J| normally seen.</param>
/// <param name="HighHz">Largest |J| normally seen.</param>
/// <param name="MayVanish">True when |J| is often below ~2 Hz and so unresolved (or exchange hides it).</param>
/// <param name="Source">Where the numbers come from.</param>
public sealed record JRange(double LowHz, double HighHz, bool MayVanish, string Source)
{
    /// <summary>True when <paramref name="hz"/> lies within the range widened by <paramref name="toleranceHz"/>.</summary>
    public bool Contains(double hz, double toleranceHz) => hz >= LowHz - toleranceHz && hz <= HighHz + toleranceHz;
}
