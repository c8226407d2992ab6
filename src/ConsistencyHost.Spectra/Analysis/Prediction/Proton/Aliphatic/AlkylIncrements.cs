using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// α/β/γ increments for protons on sp3 carbon: δ = base (CH3 0.9, CH2 1.2, CH 1.5) + Σ increments.
/// </summary>
/// <remarks>
/// Source: Beauchamp &amp; Marquez, "A general approach for calculating proton chemical shifts for methyl, methylene
/// and methine protons when there are one or more substituents within three carbons", J. Chem. Educ. 1997, 74,
/// 1483–1485 — base values and the rows marked BM, read in the table reproduced at colby.edu (NMR/sp3CH).
/// Rows marked "memory" are not in that table; their values are from memory of the methyl/methylene shift charts
/// of Pretsch, Bühlmann &amp; Badertscher, Structure Determination of Organic Compounds, Springer 2009 (e.g.
/// N-methylaniline CH3 2.81, N-methylimidazole CH3 3.65, CH3–SiMe3 0.00) and carry extra width.
/// </remarks>
internal static class AlkylIncrements
{
    /// <summary>Base shift of CH3, CH2, CH (Beauchamp–Marquez).</summary>
    public static double BaseFor(int hydrogens) => hydrogens switch { >= 3 => 0.9, 2 => 1.2, _ => 1.5 };

    /// <summary>The row for <paramref name="kind"/>; null when no row applies.</summary>
    public static AlkylIncrement? Of(Substituent kind) => kind switch
    {
        Substituent.Alkyl or Substituent.TertiaryAlkyl => new(0, 0, 0),                       // BM R-
        Substituent.Alkenyl => new(0.8, 0.2, 0.1),                                              // BM R2C=CR-
        Substituent.Alkynyl => new(0.9, 0.3, 0.1),                                              // BM RC≡C-
        Substituent.Aryl => new(1.4, 0.4, 0.1),                                                 // BM Ar-
        Substituent.AzinylCarbon => new(1.6, 0.4, 0.1, 0.1),                                    // memory: 2-picoline CH3 2.55
        Substituent.Fluoro => new(3.2, 0.5, 0.2),                                               // BM F-
        Substituent.Chloro => new(2.2, 0.5, 0.2),                                               // BM Cl-
        Substituent.Bromo => new(2.1, 0.7, 0.2),                                                // BM Br-
        Substituent.Iodo => new(2.0, 0.9, 0.1),                                                 // BM I-
        Substituent.Hydroxyl => new(2.3, 0.3, 0.1),                                             // BM HO-
        Substituent.Oxide => new(2.1, 0.2, 0.1, 0.3),                                           // memory: alkoxide ~ ether
        Substituent.Alkoxy => new(2.1, 0.3, 0.1),                                               // BM RO-
        Substituent.VinylOxy => new(2.5, 0.4, 0.2),                                             // BM R2C=CRO-
        Substituent.Aryloxy => new(2.8, 0.5, 0.3),                                              // BM ArO-
        Substituent.Formyl => new(1.1, 0.4, 0.1),                                               // BM OHC-
        Substituent.Acyl or Substituent.IminoCarbon => new(1.2, 0.3, 0.0),                      // BM RCO- (C=N: memory, same row)
        Substituent.Aroyl => new(1.7, 0.3, 0.1),                                                // BM ArCO-
        Substituent.Acyloxy => new(2.8, 0.5, 0.1),                                              // BM RCO2-
        Substituent.Aroyloxy => new(3.1, 0.5, 0.2),                                             // BM ArCO2-
        Substituent.Carboxyl => new(1.1, 0.3, 0.1),                                             // BM HO2C-
        Substituent.Carboxylate => new(1.0, 0.2, 0.1, 0.15),                                    // memory: acetate ion CH3 1.9
        Substituent.Ester => new(1.1, 0.3, 0.1),                                                // BM RO2C-
        Substituent.AcylHalide => new(1.8, 0.4, 0.1),                                           // BM ClOC-
        Substituent.PrimaryAmine or Substituent.Amine => new(1.5, 0.2, 0.1),                    // BM H2N-
        Substituent.ArylAmine => new(1.9, 0.2, 0.1, 0.1),                                       // memory: PhNHCH3 2.81
        Substituent.AmideNitrogen => new(2.1, 0.3, 0.1),                                        // BM RCONH-
        Substituent.SulfonamideNitrogen => new(1.8, 0.3, 0.1, 0.1),                             // memory: RSO2NHCH3 2.6-2.7
        Substituent.Ammonium => new(2.0, 0.4, 0.1, 0.2),                                        // memory: RCH2NH3+ 2.9-3.1
        Substituent.HeteroarylNitrogen => new(2.8, 0.5, 0.1, 0.15),                             // memory: N-methylazoles 3.6-3.9
        Substituent.IminoNitrogen => new(2.4, 0.3, 0.1, 0.15),                                  // memory: CH3N=CHPh 3.5
        Substituent.Azide => new(2.1, 0.4, 0.1, 0.1),                                           // memory: EtN3 CH2 3.3
        Substituent.AmideCarbon => new(1.0, 0.3, 0.1),                                          // BM H2NOC-
        Substituent.Nitrile => new(1.1, 0.4, 0.2),                                              // BM N≡C-
        Substituent.Nitro => new(3.2, 0.8, 0.1),                                                // BM O2N-
        Substituent.Thiol => new(1.3, 0.4, 0.1),                                                // BM HS-
        Substituent.Sulfide => new(1.3, 0.4, 0.1),                                              // BM RS-
        Substituent.ThioEster => new(1.5, 0.4, 0.1, 0.1),                                       // memory: CH3SC(O)R 2.3
        Substituent.Sulfonyloxy => new(2.8, 0.4, 0.0),                                          // BM ArSO3-
        Substituent.HeteroOxy => new(2.8, 0.4, 0.1, 0.15),                                      // memory: CH3ON= 3.85, CH3OP 3.75
        Substituent.Sulfinyl => new(1.6, 0.5, 0.3),                                             // BM RSO-
        Substituent.Sulfonyl => new(1.8, 0.5, 0.3),                                             // BM RSO2-
        Substituent.Silyl => new(-0.9, 0.0, 0.0, 0.2),                                          // memory: (CH3)4Si 0.00
        Substituent.Boryl => new(-0.3, 0.1, 0.0, 0.3),                                          // memory: CH2–B 0.8-1.0
        Substituent.Phosphino => new(0.3, 0.1, 0.0, 0.3),                                       // memory
        Substituent.Phosphoryl => new(0.7, 0.2, 0.1, 0.25),                                     // memory: CH3P(O)(OEt)2 1.5, Ph3P+CH3 3.2
        _ => null,
    };
}
