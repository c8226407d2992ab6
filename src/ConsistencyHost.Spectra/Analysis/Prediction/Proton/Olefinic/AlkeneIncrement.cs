namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Olefinic;

/// <summary>Increments of one substituent on a C=C for a vinyl proton on the same carbon (gem), on the other carbon
/// on the same side (cis) or the opposite side (trans).</summary>
/// <param name="Gem">Z_gem.</param>
/// <param name="Cis">Z_cis.</param>
/// <param name="Trans">Z_trans.</param>
/// <param name="Uncertainty">Extra half-width for approximate rows.</param>
internal readonly record struct AlkeneIncrement(double Gem, double Cis, double Trans, double Uncertainty = 0);
