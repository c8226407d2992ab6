namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>Increments of a ring substituent on a benzene proton ortho, meta and para to it.</summary>
/// <param name="Ortho">Z for the proton next to the substituent.</param>
/// <param name="Meta">Z two ring bonds away.</param>
/// <param name="Para">Z three ring bonds away.</param>
/// <param name="Uncertainty">Extra half-width for approximate rows.</param>
internal readonly record struct RingIncrement(double Ortho, double Meta, double Para, double Uncertainty = 0)
{
    /// <summary>The increment at ring distance 1, 2 or 3.</summary>
    public double At(int distance) => distance switch { 1 => Ortho, 2 => Meta, _ => Para };
}
