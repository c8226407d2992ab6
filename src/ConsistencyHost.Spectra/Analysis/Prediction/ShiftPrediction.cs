namespace ConsistencyHost.Spectra.Analysis.Prediction;

/// <summary>A predicted shift window with how it was built.</summary>
/// <param name="Window">The plausible range and most likely value.</param>
/// <param name="Basis">The method behind it.</param>
/// <param name="Reasons">Short phrases a chemist can check ("base CH2 1.37", "α-OC(=O)R +2.98", "±0.4 for two substituents").</param>
public sealed record ShiftPrediction(ShiftWindow Window, ShiftBasis Basis, IReadOnlyList<string> Reasons);
