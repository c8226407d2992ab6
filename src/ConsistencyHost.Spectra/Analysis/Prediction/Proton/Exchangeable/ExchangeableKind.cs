namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Exchangeable;

/// <summary>Classes of O–H, N–H and S–H protons whose shift ranges differ (per solvent) enough to matter.</summary>
internal enum ExchangeableKind
{
    /// <summary>H2O itself.</summary>
    Water,
    /// <summary>Alcohol O–H.</summary>
    AlcoholOH,
    /// <summary>Phenol O–H without an intramolecular hydrogen bond.</summary>
    PhenolOH,
    /// <summary>O–H chelated to an ortho or β C=O/C=N/NO2 (salicyl, enol of a 1,3-dicarbonyl).</summary>
    ChelatedOH,
    /// <summary>Carboxylic acid O–H.</summary>
    CarboxylicOH,
    /// <summary>Oxime or hydroxamic acid O–H.</summary>
    OximeOH,
    /// <summary>Boronic acid O–H.</summary>
    BoronicOH,
    /// <summary>Other O–H (P–OH, S–OH, Si–OH, hydroxylamine).</summary>
    OtherOH,
    /// <summary>Aliphatic amine N–H.</summary>
    AmineNH,
    /// <summary>Aniline N–H (one aryl).</summary>
    ArylAmineNH,
    /// <summary>N–H between two aryls.</summary>
    DiarylAmineNH,
    /// <summary>N–H on a heteroaromatic ring carbon (aminopyridine, aminothiazole).</summary>
    HeteroarylAmineNH,
    /// <summary>N–H chelated to an ortho C=O or NO2, or of a vinylogous amide.</summary>
    ChelatedNH,
    /// <summary>Ammonium N–H.</summary>
    AmmoniumNH,
    /// <summary>Protonated aromatic N–H (pyridinium).</summary>
    AromaticCationNH,
    /// <summary>Secondary amide N–H, N-alkyl (incl. lactams).</summary>
    AmideNH,
    /// <summary>Amide N–H, N-aryl (anilides, cyclic anilides such as oxindole).</summary>
    AnilideNH,
    /// <summary>Primary amide NH2.</summary>
    PrimaryAmideNH,
    /// <summary>Carbamate N–H, N-alkyl.</summary>
    CarbamateNH,
    /// <summary>Carbamate N–H, N-aryl.</summary>
    ArylCarbamateNH,
    /// <summary>Urea N–H, N-alkyl or NH2.</summary>
    UreaNH,
    /// <summary>Urea N–H, N-aryl.</summary>
    ArylUreaNH,
    /// <summary>Imide or acyl sulfonamide N–H.</summary>
    ImideNH,
    /// <summary>Sulfonamide N–H, N-alkyl or NH2.</summary>
    SulfonamideNH,
    /// <summary>Sulfonamide N–H, N-aryl.</summary>
    SulfonanilideNH,
    /// <summary>Hydrazide N–H (C(=O)NH–N).</summary>
    HydrazideNH,
    /// <summary>Other N–H bonded to N (hydrazines, hydrazones).</summary>
    HydrazineNH,
    /// <summary>Pyrrole-type N–H (pyrrole, indole, carbazole).</summary>
    PyrroleNH,
    /// <summary>Azole N–H (imidazole, pyrazole, triazole, tetrazole, benzimidazole).</summary>
    AzoleNH,
    /// <summary>Ring N–H of an aromatic lactam (pyridone, uracil, quinazolinone).</summary>
    AromaticLactamNH,
    /// <summary>Amidine, guanidine, imine and enamine N–H.</summary>
    AmidineNH,
    /// <summary>Thioamide and thiourea N–H.</summary>
    ThioamideNH,
    /// <summary>Alkyl thiol S–H.</summary>
    AlkylThiol,
    /// <summary>Aryl thiol S–H.</summary>
    ArylThiol,
    /// <summary>Anything else on N/O/S.</summary>
    Other,
}
