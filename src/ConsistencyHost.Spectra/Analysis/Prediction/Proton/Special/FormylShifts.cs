using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Special;

/// <summary>
/// Tabulated windows for H–C(=O)–X and H–C(=N–)–X: aldehydes, formates, formamides, aldimines, oximes, hydrazones.
/// </summary>
/// <remarks>
/// Ranges (CDCl3) from memory of the 1H charts of Pretsch, Bühlmann &amp; Badertscher, Structure Determination of
/// Organic Compounds, Springer 2009, with parents named: aliphatic CHO 9.5–9.9 (acetaldehyde 9.79), aromatic CHO
/// 9.8–10.1 and up to 10.6 for 2,6-disubstituted (benzaldehyde 10.0, furfural 9.66), enals 9.4–9.7 (cinnamaldehyde
/// 9.70, β,β-disubstituted up to 10.1), formates 8.0–8.1, formamides 7.9–8.3 with N-aryl rotamers to 8.7 (DMF 8.02
/// in CDCl3, 7.95 in DMSO-d6: Gottlieb 1997), aryl aldimines 8.2–8.6, alkyl aldimines 7.5–7.8, aldoximes 7.3–8.2,
/// hydrazones 6.6–8.3 and acylhydrazones up to 8.6 in DMSO-d6, formamidines and imidates 7.3–8.6.
/// </remarks>
internal static class FormylShifts
{
    /// <summary>The window for H on <paramref name="carbon"/>, doubly bonded to O/S (<paramref name="imine"/> false) or N.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int doubleBonded, bool imine, string? solvent)
    {
        var (low, high, likely, what) = imine ? Imine(context, carbon, doubleBonded) : Carbonyl(context, carbon, doubleBonded);
        var estimate = new ProtonEstimate().Start(likely, what + " (tabulated)");
        estimate.Cover(low, "range from");
        estimate.Cover(high, "range to");
        SolventStretch.Apply(estimate, solvent, nearPolarGroup: true);
        return estimate.Finish(ShiftBasis.TabulatedEnvironment);
    }

    private static (double, double, double, string) Carbonyl(PredictionContext context, int carbon, int oxygen)
    {
        var other = OtherNeighbour(context, carbon, oxygen);
        if (other < 0) return (9.4, 9.9, 9.6, "H2C=O");
        return SubstituentClassifier.Classify(context, carbon, other) switch
        {
            Substituent.Alkoxy or Substituent.Aryloxy or Substituent.VinylOxy or Substituent.Hydroxyl or Substituent.Oxide
                or Substituent.Acyloxy or Substituent.HeteroOxy => (7.85, 8.35, 8.05, "formate H–C(=O)O"),
            Substituent.Amine or Substituent.PrimaryAmine or Substituent.AmideNitrogen or Substituent.SulfonamideNitrogen
                or Substituent.HeteroarylNitrogen or Substituent.Ammonium => (7.7, 8.5, 8.1, "formamide H–C(=O)N"),
            Substituent.ArylAmine => (7.9, 8.95, 8.4, "N-aryl formamide H–C(=O)N"),
            Substituent.Aryl or Substituent.AzinylCarbon => (9.35, 10.7, 9.95, "aromatic aldehyde"),
            Substituent.Alkenyl => (9.2, 10.3, 9.55, "α,β-unsaturated aldehyde"),
            Substituent.Alkynyl => (8.9, 9.5, 9.2, "alkynyl aldehyde"),
            Substituent.Sulfide or Substituent.Thiol => (9.7, 10.4, 10.0, "thioformate H–C(=O)S"),
            Substituent.Acyl or Substituent.Aroyl or Substituent.Formyl or Substituent.Ester or Substituent.AmideCarbon
                or Substituent.Carboxyl => (9.0, 9.7, 9.35, "α-oxo aldehyde"),
            _ => (9.35, 10.0, 9.72, "aliphatic aldehyde"),
        };
    }

    private static (double, double, double, string) Imine(PredictionContext context, int carbon, int nitrogen)
    {
        var other = OtherNeighbour(context, carbon, nitrogen);
        var onNitrogen = OtherNeighbour(context, nitrogen, carbon);
        var nitrogenSide = onNitrogen < 0 ? 1 : context.Molecule.Atoms[onNitrogen].AtomicNumber;
        var carbonSide = other < 0 ? Substituent.Other : SubstituentClassifier.Classify(context, carbon, other);
        if (carbonSide is Substituent.Amine or Substituent.PrimaryAmine or Substituent.AmideNitrogen or Substituent.ArylAmine
            or Substituent.Alkoxy or Substituent.Aryloxy or Substituent.Sulfide or Substituent.HeteroarylNitrogen)
        {
            return (7.2, 8.7, 7.9, "formamidine/imidate N=CH–X");
        }

        var aryl = carbonSide is Substituent.Aryl or Substituent.AzinylCarbon or Substituent.Alkenyl;
        return nitrogenSide switch
        {
            8 => aryl ? (7.6, 8.6, 8.15, "aryl aldoxime CH=N–O") : (6.6, 8.0, 7.4, "aldoxime CH=N–O"),
            7 => aryl ? (7.0, 8.9, 7.9, "aryl hydrazone CH=N–N") : (6.2, 8.0, 7.1, "hydrazone CH=N–N"),
            16 => (8.3, 9.3, 8.75, "sulfinyl/sulfonyl imine CH=N–S"),
            _ => aryl ? (7.9, 8.8, 8.35, "aryl aldimine CH=N") : (7.3, 8.1, 7.65, "aldimine CH=N"),
        };
    }

    private static int OtherNeighbour(PredictionContext context, int atom, int except)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (n != except) return n;
        }

        return -1;
    }
}
