using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Olefinic;

/// <summary>
/// Pascual–Meier–Simon increments for vinyl protons: δ = 5.25 + Z_gem + Z_cis + Z_trans.
/// </summary>
/// <remarks>
/// Source: Pascual, Meier &amp; Simon, Helv. Chim. Acta 1966, 49, 164, as tabulated by Pretsch, Bühlmann &amp;
/// Badertscher, Structure Determination of Organic Compounds, Springer 2009, pp. 168–169 — values as transcribed in a
/// public code file citing those pages, which agree with the same rows in two further public transcriptions (read).
/// "conj" rows apply when the double bond or the substituent is further conjugated. Rows marked M are from memory
/// (SiR3, BR2, N-azolyl, C=N) and carry extra width.
/// </remarks>
internal static class AlkeneIncrements
{
    /// <summary>Base value: ethylene.</summary>
    public const double Base = 5.25;

    /// <summary>The row for a substituent; null when no row applies.</summary>
    /// <param name="kind">The substituent.</param>
    /// <param name="inRing">True when the substituent's atom is in a ring with the double bond.</param>
    /// <param name="conjugated">True when the double bond carries another conjugating group.</param>
    public static AlkeneIncrement? Of(Substituent kind, bool inRing, bool conjugated) => kind switch
    {
        Substituent.Alkyl or Substituent.TertiaryAlkyl when inRing => new(0.69, -0.25, -0.28),   // alkyl-ring
        Substituent.Alkyl or Substituent.TertiaryAlkyl => new(0.45, -0.22, -0.28),               // alkyl
        Substituent.OxyAlkyl => new(0.64, -0.01, -0.02),                                          // CH2O, CH2I
        Substituent.HaloAlkyl => new(0.70, 0.11, -0.04),                                          // CH2Cl, CH2Br
        Substituent.AminoAlkyl => new(0.58, -0.10, -0.08),                                        // CH2N
        Substituent.ThioAlkyl => new(0.71, -0.13, -0.22),                                         // CH2S
        Substituent.CarbonylAlkyl => new(0.69, -0.08, -0.06),                                     // CH2C=O, CH2CN
        Substituent.BenzylicAlkyl => new(1.05, -0.29, -0.32),                                     // CH2Ar
        Substituent.Trihalomethyl => new(0.66, 0.61, 0.32),                                       // CF3
        Substituent.Alkenyl when conjugated => new(1.24, 0.02, -0.05),                            // C=C conj
        Substituent.Alkenyl => new(1.00, -0.09, -0.23),                                           // C=C
        Substituent.Alkynyl => new(0.47, 0.38, 0.12),                                             // C≡C
        Substituent.Aryl or Substituent.AzinylCarbon => new(1.38, 0.36, -0.07, 0.1),              // aromatic
        Substituent.Nitrile => new(0.27, 0.75, 0.55),                                             // C≡N
        Substituent.Formyl => new(1.02, 0.95, 1.17),                                              // CHO
        Substituent.Acyl or Substituent.Aroyl when conjugated || kind == Substituent.Aroyl => new(1.06, 0.91, 0.74), // CO conj
        Substituent.Acyl => new(1.10, 1.12, 0.87),                                                // CO
        Substituent.Carboxyl when conjugated => new(0.80, 0.98, 0.32),                            // COOH conj
        Substituent.Carboxyl or Substituent.Carboxylate => new(0.97, 1.41, 0.71),                 // COOH
        Substituent.Ester when conjugated => new(0.78, 1.01, 0.46),                               // COOR conj
        Substituent.Ester => new(0.80, 1.18, 0.55),                                               // COOR
        Substituent.AmideCarbon => new(1.37, 0.98, 0.46),                                         // CONR2
        Substituent.AcylHalide => new(1.11, 1.46, 1.01),                                          // COCl
        Substituent.IminoCarbon => new(1.06, 0.91, 0.74, 0.25),                                   // M: as CO conj
        Substituent.Alkoxy or Substituent.Hydroxyl => new(1.22, -1.07, -1.21),                    // OR, R aliphatic
        Substituent.Aryloxy or Substituent.VinylOxy or Substituent.HeteroOxy => new(1.21, -0.60, -1.00), // OR, R conj
        Substituent.Acyloxy or Substituent.Aroyloxy or Substituent.Sulfonyloxy => new(2.11, -0.35, -0.64), // OCOR
        Substituent.Amine or Substituent.PrimaryAmine => new(0.80, -1.26, -1.21),                // NR2, R aliphatic
        Substituent.ArylAmine or Substituent.IminoNitrogen => new(1.17, -0.53, -0.99),            // NR2, R conj
        Substituent.AmideNitrogen or Substituent.SulfonamideNitrogen => new(2.08, -0.57, -0.72),  // N–C=O
        Substituent.HeteroarylNitrogen => new(1.80, -0.40, -0.60, 0.3),                           // M N-vinylazoles
        Substituent.Nitro => new(1.87, 1.30, 0.62),                                               // NO2
        Substituent.Fluoro => new(1.54, -0.40, -1.02),                                            // F
        Substituent.Chloro => new(1.08, 0.18, 0.13),                                              // Cl
        Substituent.Bromo => new(1.07, 0.45, 0.55),                                               // Br
        Substituent.Iodo => new(1.14, 0.81, 0.88),                                                // I
        Substituent.Sulfide or Substituent.Thiol => new(1.11, -0.29, -0.13),                      // SR
        Substituent.ThioEster => new(1.41, 0.06, 0.02),                                           // SCOR
        Substituent.Sulfinyl => new(1.27, 0.67, 0.41),                                            // S(O)R
        Substituent.Sulfonyl => new(1.55, 1.16, 0.93),                                            // SO2R
        Substituent.Phosphoryl => new(0.66, 0.88, 0.67, 0.15),                                    // P(O)(OR)2
        Substituent.Silyl => new(0.80, 0.60, 0.40, 0.35),                                         // M vinylsilanes
        Substituent.Boryl => new(0.40, 1.30, 0.70, 0.4),                                          // M vinyl boronates
        _ => null,
    };

    /// <summary>True for groups that conjugate with the double bond (selects the "conj" rows of the others).</summary>
    public static bool IsConjugating(Substituent kind) => kind is Substituent.Alkenyl or Substituent.Alkynyl or Substituent.Aryl
        or Substituent.AzinylCarbon or Substituent.Nitrile or Substituent.Formyl or Substituent.Acyl or Substituent.Aroyl
        or Substituent.Carboxyl or Substituent.Ester or Substituent.AmideCarbon or Substituent.AcylHalide or Substituent.Nitro;
}
