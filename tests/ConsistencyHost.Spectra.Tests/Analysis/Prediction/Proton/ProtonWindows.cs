using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Proton;

/// <summary>Reads a structure and predicts the 1H window of one heavy atom's hydrogens.</summary>
internal static class ProtonWindows
{
    /// <summary>The prediction for the H on atom <paramref name="atom"/> of <paramref name="smiles"/>.</summary>
    public static ShiftPrediction For(string smiles, int atom, string? solvent)
    {
        var molecule = SmilesReader.Read(smiles).Value ?? throw new ArgumentException($"unreadable SMILES {smiles}");
        return ProtonShifts.Predict(PredictionContext.Of(molecule), atom, solvent);
    }

    /// <summary>Asserts that <paramref name="ppm"/> lies in the window of the H on <paramref name="atom"/>.</summary>
    public static void AssertHolds(string smiles, int atom, string? solvent, double ppm)
    {
        var p = For(smiles, atom, solvent);
        Xunit.Assert.True(p.Window.Contains(ppm), $"{ppm:0.00} outside {Describe(p)}");
    }

    /// <summary>A readable account of a window for assertion messages.</summary>
    public static string Describe(ShiftPrediction p) =>
        $"{p.Window.Low:0.00}–{p.Window.High:0.00} (likely {p.Window.MostLikely:0.00}, {p.Basis}): {string.Join("; ", p.Reasons)}";
}
