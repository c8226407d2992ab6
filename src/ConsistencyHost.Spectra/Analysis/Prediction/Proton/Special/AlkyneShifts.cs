using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Special;

/// <summary>
/// Terminal alkyne ≡C–H: a tabulated value by what the other alkyne carbon carries, moved downfield in hydrogen-bond
/// accepting solvents (the ≡C–H is weakly acidic, like CHCl3: 7.26 in CDCl3, 8.32 in DMSO-d6, Gottlieb 1997).
/// </summary>
/// <remarks>Values in CDCl3 from memory of Pretsch, Bühlmann &amp; Badertscher 2009: 1-alkynes 1.9–2.0, propargyl
/// ethers/alcohols/halides 2.4–2.5, aryl acetylenes 3.0–3.1, propiolates and ynones 2.9–3.3, enynes 2.9. Solvent
/// shifts (from memory): phenylacetylene ≈ +1.1 in DMSO-d6; the window spans 0.7–1.3 there.</remarks>
internal static class AlkyneShifts
{
    /// <summary>The window for the H on terminal alkyne carbon <paramref name="carbon"/> bonded to <paramref name="partner"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int partner, string? solvent)
    {
        var (ppm, what) = Tabulated(context, partner, carbon);
        var estimate = new ProtonEstimate().Start(ppm, "≡C–H, " + what + " (tabulated)");
        estimate.Widen(0.25, "spread of parents");
        switch (solvent)
        {
            case "DMSO-d6":
                estimate.Shift(1.0, "DMSO-d6 hydrogen bond to ≡C–H");
                estimate.Widen(0.3, "solvent shift spread");
                break;
            case "acetone-d6" or "THF-d8":
                estimate.Shift(0.6, solvent + " hydrogen bond to ≡C–H");
                estimate.Widen(0.25, "solvent shift spread");
                break;
            case "CD3CN" or "CD3OD" or "D2O":
                estimate.Shift(0.4, solvent + " hydrogen bond to ≡C–H");
                estimate.Widen(0.2, "solvent shift spread");
                break;
            case "C6D6" or "toluene-d8":
                estimate.Stretch(0.4, 0, "aromatic solvent: up to −0.40");
                break;
            case null:
                estimate.Stretch(0.1, 1.3, "solvent not given: up to +1.3 in DMSO-d6");
                break;
        }

        return estimate.Finish(ShiftBasis.TabulatedEnvironment);
    }

    private static (double Ppm, string What) Tabulated(PredictionContext context, int partner, int carbon)
    {
        foreach (var n in context.Molecule.Neighbours(partner))
        {
            if (n == carbon) continue;
            return SubstituentClassifier.Classify(context, partner, n) switch
            {
                Substituent.Aryl or Substituent.AzinylCarbon => (3.08, "aryl-C≡"),
                Substituent.Alkenyl => (2.95, "alkenyl-C≡"),
                Substituent.Formyl or Substituent.Acyl or Substituent.Aroyl or Substituent.Ester or Substituent.Carboxyl
                    or Substituent.AmideCarbon => (3.05, "carbonyl-C≡"),
                Substituent.OxyAlkyl or Substituent.HaloAlkyl or Substituent.AminoAlkyl or Substituent.ThioAlkyl => (2.35, "X–CH2–C≡"),
                Substituent.Silyl => (2.40, "silyl-C≡"),
                Substituent.AmideNitrogen or Substituent.SulfonamideNitrogen => (2.80, "ynamide"),
                _ => (1.97, "alkyl-C≡"),
            };
        }

        return (1.91, "acetylene");
    }
}
