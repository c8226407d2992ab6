namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>Increments of one substituent on an sp3 C–H: on the same carbon (α), one carbon away (β), two away (γ).</summary>
/// <param name="Alpha">Increment when the group is on the proton's carbon.</param>
/// <param name="Beta">Increment when the group is on a neighbouring carbon.</param>
/// <param name="Gamma">Increment when the group is two carbons away.</param>
/// <param name="Uncertainty">Extra half-width for rows that are approximations (from memory or a neighbouring row).</param>
internal readonly record struct AlkylIncrement(double Alpha, double Beta, double Gamma, double Uncertainty = 0);
