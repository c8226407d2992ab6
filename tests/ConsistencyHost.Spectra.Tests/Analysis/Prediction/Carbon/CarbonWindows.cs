using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Carbon;

/// <summary>Reads a SMILES and predicts one carbon.</summary>
internal static class CarbonWindows
{
    public static ShiftPrediction Of(string smiles, int carbon, string? solvent = "CDCl3") =>
        CarbonShifts.Predict(PredictionContext.Of(SmilesReader.Read(smiles).Value!), carbon, solvent);
}
