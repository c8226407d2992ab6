using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// Tabulated shifts of CH3–X for a methyl on a functional group, where one-substituent additivity is known to drift
/// (strongly electronegative or heavy X: CH3I 2.16 against 0.9 + 2.0 = 2.9 from the increments).
/// </summary>
/// <remarks>
/// Values in CDCl3, from memory of the methyl shift charts of Pretsch, Bühlmann &amp; Badertscher, Structure
/// Determination of Organic Compounds, Springer 2009 (parent compounds named beside each row), except where a
/// published impurity table gives the parent: MTBE OCH3 3.22, DMF NCH3 2.88/2.96, DMSO 2.62, acetone 2.17, acetic
/// acid 2.10, acetonitrile 2.10, toluene 2.36 (Gottlieb, Kotlyar &amp; Nudelman, J. Org. Chem. 1997, 62, 7512).
/// </remarks>
internal static class MethylShifts
{
    /// <summary>(shift, half-width) of CH3–X for the group kind; null when the increments apply instead.</summary>
    public static (double Ppm, double HalfWidth)? Of(Substituent kind) => kind switch
    {
        Substituent.Fluoro => (4.27, 0.2),            // CH3F
        Substituent.Chloro => (3.05, 0.2),            // CH3Cl
        Substituent.Bromo => (2.68, 0.2),             // CH3Br
        Substituent.Iodo => (2.16, 0.2),              // CH3I
        Substituent.Hydroxyl => (3.40, 0.25),         // CH3OH 3.49 (CDCl3), 3.16 (DMSO-d6): Gottlieb
        Substituent.Alkoxy => (3.32, 0.2),            // MTBE 3.22 (Gottlieb), MeOCH2R 3.3-3.4
        Substituent.Aryloxy => (3.80, 0.2),           // anisole 3.80
        Substituent.VinylOxy => (3.60, 0.3),          // methyl vinyl ether 3.5-3.7
        Substituent.Acyloxy => (3.70, 0.2),           // methyl acetate 3.67, methyl carbamates 3.65-3.7
        Substituent.Aroyloxy => (3.90, 0.2),          // methyl benzoate 3.91
        Substituent.Sulfonyloxy => (3.85, 0.25),      // methyl tosylate 3.73, methyl triflate 4.2
        Substituent.HeteroOxy => (3.80, 0.3),         // CH3ON= 3.85-3.95, (MeO)3P=O 3.75
        Substituent.Nitro => (4.30, 0.2),             // nitromethane 4.30
        Substituent.PrimaryAmine or Substituent.Amine => (2.30, 0.25),  // Me3N 2.22, MeNHR 2.4
        Substituent.ArylAmine => (2.88, 0.25),        // PhNHMe 2.81, PhNMe2 2.93
        Substituent.AmideNitrogen => (2.90, 0.3),     // DMF 2.88/2.96 (Gottlieb), NMe amides 2.75-3.1
        Substituent.SulfonamideNitrogen => (2.70, 0.25), // MeNHSO2Ar 2.6, Me2NSO2Ar 2.7
        Substituent.Ammonium => (3.15, 0.35),         // Me4N+ 3.1-3.4, MeNH3+ 2.6
        Substituent.HeteroarylNitrogen => (3.80, 0.35), // N-methyl imidazole 3.65, indole 3.78, pyrazole 3.88, pyridinium 4.4
        Substituent.IminoNitrogen => (3.40, 0.3),     // CH3N=CHPh 3.5
        Substituent.Azide => (3.25, 0.3),             // methyl azide
        Substituent.Thiol => (2.05, 0.2),             // CH3SH 2.0
        Substituent.Sulfide => (2.20, 0.3),           // Me2S 2.1, MeSAr 2.48
        Substituent.ThioEster => (2.33, 0.2),         // CH3SC(O)R 2.33
        Substituent.Sulfinyl => (2.62, 0.2),          // DMSO 2.62 (Gottlieb), MeS(O)Ar 2.72
        Substituent.Sulfonyl => (2.95, 0.25),         // MeSO2Ar 3.05, MeSO2NR2 2.8-2.9
        Substituent.Acyl => (2.15, 0.2),              // acetone 2.17 (Gottlieb)
        Substituent.Aroyl => (2.60, 0.2),             // acetophenone 2.60
        Substituent.Ester => (2.07, 0.25),            // ethyl acetate 2.05 (Gottlieb), phenyl acetate 2.29
        Substituent.Carboxyl => (2.08, 0.2),          // acetic acid 2.10 (Gottlieb)
        Substituent.Carboxylate => (1.90, 0.2),       // acetate ion
        Substituent.AmideCarbon => (2.02, 0.2),       // acetamides 1.9-2.1
        Substituent.AcylHalide => (2.66, 0.2),        // acetyl chloride 2.66
        Substituent.Formyl => (2.20, 0.2),            // acetaldehyde 2.20
        Substituent.IminoCarbon => (2.00, 0.3),       // acetone oxime 1.9, ketimines 1.9-2.3
        Substituent.Nitrile => (2.02, 0.2),           // acetonitrile 2.10 (Gottlieb), propionitrile CH3 1.3 is β
        Substituent.Aryl => (2.33, 0.25),             // toluene 2.36 (Gottlieb), o-toluic acid 2.65
        Substituent.AzinylCarbon => (2.55, 0.25),     // 2-picoline 2.55
        Substituent.Alkenyl => (1.72, 0.2),           // isobutene 1.73, allylic CH3 1.6-1.8
        Substituent.Alkynyl => (1.82, 0.2),           // 2-butyne 1.75, propyne 1.8
        Substituent.Silyl => (0.05, 0.2),             // TMS 0.00, TMS ethers 0.1
        _ => null,
    };
}
