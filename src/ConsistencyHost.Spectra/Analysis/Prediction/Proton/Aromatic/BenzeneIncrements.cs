using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>
/// Substituent increments for benzene protons: δ = 7.34 + Σ Z(ortho/meta/para).
/// </summary>
/// <remarks>
/// Source: Pretsch, Bühlmann &amp; Badertscher, Structure Determination of Organic Compounds, 4th ed., Springer 2009,
/// 1H tables for monosubstituted benzenes (pp. 178–179), base 7.34 — values as transcribed in a public code file that
/// cites those pages (rows marked P). With base 7.34 they reproduce the Gottlieb 1997 toluene lines exactly
/// (o/p 7.17, m 7.25). Rows marked M are from memory of the parent monosubstituted benzenes in CDCl3 (PhCF3 7.64/7.47/
/// 7.55, PhSO2Me 7.96/7.58/7.67, PhS(O)Me 7.65/7.50/7.50, 2-phenylpyridine, PhBpin, Ph3PO, PhN3, phenyl triflate) and
/// carry extra width.
/// </remarks>
internal static class BenzeneIncrements
{
    /// <summary>Benzene base value of the table.</summary>
    public const double Base = 7.34;

    /// <summary>The row for a substituent kind; null when no row applies.</summary>
    public static RingIncrement? Of(Substituent kind, int nitrogenHydrogens) => kind switch
    {
        Substituent.Alkyl or Substituent.BenzylicAlkyl or Substituent.AminoAlkyl or Substituent.ThioAlkyl
            or Substituent.CarbonylAlkyl => new(-0.17, -0.09, -0.17),            // P –CH3
        Substituent.TertiaryAlkyl => new(0.05, -0.05, -0.18),                   // P –C(CH3)3
        Substituent.OxyAlkyl => new(-0.07, -0.07, -0.07),                       // P –CH2OH
        Substituent.HaloAlkyl => new(0.00, 0.00, -0.04, 0.1),                   // M PhCH2Cl 7.38
        Substituent.Trihalomethyl => new(0.32, 0.14, 0.20, 0.1),                // M PhCF3
        Substituent.Alkenyl => new(0.06, -0.03, -0.10),                         // M styrene 7.40/7.32/7.24
        Substituent.Alkynyl => new(0.16, -0.01, -0.01),                         // P –C≡CH
        Substituent.Aryl => new(0.22, 0.06, -0.04),                             // P –phenyl
        Substituent.AzinylCarbon => new(0.65, 0.11, 0.05, 0.1),                 // M 2-phenylpyridine 7.99/7.46/7.40
        Substituent.Nitrile => new(0.32, 0.14, 0.28),                           // P –C≡N
        Substituent.Formyl => new(0.54, 0.19, 0.29),                            // P –CHO
        Substituent.Acyl => new(0.62, 0.12, 0.22),                              // P –COCH3
        Substituent.Aroyl => new(0.56, 0.12, 0.23),                             // P –CO-phenyl
        Substituent.Carboxyl => new(0.70, 0.09, 0.21, 0.05),                    // P –COOH
        Substituent.Carboxylate => new(0.50, 0.00, 0.05, 0.2),                  // M benzoate ion
        Substituent.Ester => new(0.73, 0.11, 0.20),                             // P –COOCH3
        Substituent.AmideCarbon => new(0.48, 0.11, 0.19, 0.2),                  // P –CONH2; tertiary benzamides twist (o 7.4)
        Substituent.AcylHalide => new(0.77, 0.15, 0.35),                        // P –COCl
        Substituent.IminoCarbon => new(0.45, 0.10, 0.10, 0.15),                 // M ArCH=NR ortho 7.7-7.9
        Substituent.PrimaryAmine => new(-0.67, -0.20, -0.59),                   // P –NH2
        Substituent.Amine => nitrogenHydrogens > 0 ? new(-0.73, -0.16, -0.64) : new(-0.60, -0.10, -0.62), // P –NHCH3, –N(CH3)2
        Substituent.ArylAmine => new(-0.26, -0.10, -0.34, 0.1),                 // P –N(phenyl)2
        Substituent.AmideNitrogen => new(0.15, -0.02, -0.23, 0.05),             // P –NHCOCH3
        Substituent.SulfonamideNitrogen => new(-0.12, -0.04, -0.19, 0.15),      // M PhNHSO2R 7.2/7.3/7.15
        Substituent.Ammonium => new(0.72, 0.40, 0.34, 0.1),                     // P –N+(CH3)3
        Substituent.Nitro => new(0.93, 0.26, 0.39),                             // P –NO2
        Substituent.HeteroarylNitrogen => new(0.25, 0.08, -0.05, 0.2),          // M 1-phenylpyrazole/-imidazole/-pyrrole
        Substituent.IminoNitrogen => new(-0.14, 0.06, -0.10, 0.15),             // M PhN=CHPh N-aryl ring
        Substituent.Azide => new(-0.31, 0.00, -0.21, 0.1),                      // M PhN3 7.03/7.34/7.13
        Substituent.Hydroxyl or Substituent.Oxide => new(-0.51, -0.10, -0.41, 0.05), // P –OH
        Substituent.Alkoxy => new(-0.44, -0.05, -0.40),                         // P –OCH3
        Substituent.VinylOxy => new(-0.35, -0.02, -0.28, 0.1),                  // M phenyl vinyl ether
        Substituent.Aryloxy => new(-0.33, -0.02, -0.25),                        // P –O-phenyl
        Substituent.Acyloxy => new(-0.26, 0.03, -0.12),                         // P –OCOCH3
        Substituent.Aroyloxy => new(-0.14, 0.07, -0.08, 0.1),                   // M phenyl benzoate 7.22/7.42/7.27
        Substituent.Sulfonyloxy => new(-0.06, 0.08, 0.02, 0.1),                 // M phenyl triflate/mesylate
        Substituent.HeteroOxy => new(-0.20, 0.00, -0.20, 0.2),                  // M aryl phosphates, oximes
        Substituent.Thiol => new(-0.08, -0.16, -0.22),                          // P –SH
        Substituent.Sulfide => new(-0.08, -0.10, -0.24, 0.05),                  // P –SCH3
        Substituent.ThioEster => new(0.06, 0.06, 0.06, 0.15),                   // M PhSC(O)R 7.4
        Substituent.Sulfinyl => new(0.31, 0.16, 0.16, 0.1),                     // M PhS(O)Me
        Substituent.Sulfonyl => new(0.62, 0.24, 0.33, 0.1),                     // M PhSO2Me, PhSO2NH2, PhSO2Cl
        Substituent.Fluoro => new(-0.30, -0.03, -0.22),                         // P –F
        Substituent.Chloro => new(0.00, -0.05, -0.11),                          // P –Cl (chlorobenzene 7.34/7.29/7.23)
        Substituent.Bromo => new(0.15, -0.12, -0.06),                           // P –Br
        Substituent.Iodo => new(0.36, -0.24, -0.02),                            // P –I
        Substituent.Silyl => new(0.18, 0.02, 0.02, 0.05),                       // M PhSiMe3 7.52/7.36/7.36
        Substituent.Boryl => new(0.46, 0.02, 0.10, 0.1),                        // M PhBpin 7.81/7.37/7.46
        Substituent.Phosphoryl => new(0.38, 0.12, 0.20, 0.1),                   // M Ph3PO 7.67/7.46/7.54
        Substituent.Phosphino => new(0.0, 0.0, 0.0, 0.15),                      // M PPh3 7.3
        _ => null,
    };
}
