namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

/// <summary>
/// The kind of group attached to an atom, as the 1H increment tables distinguish them (Beauchamp–Marquez α/β/γ,
/// Pascual–Meier–Simon gem/cis/trans, benzene ortho/meta/para). One classification serves all three tables.
/// </summary>
internal enum Substituent
{
    /// <summary>No table row: the increment is taken as zero and the window widened.</summary>
    Other,

    /// <summary>sp3 carbon with only carbon or hydrogen around it.</summary>
    Alkyl,

    /// <summary>sp3 carbon carrying three further carbons (tert-butyl type).</summary>
    TertiaryAlkyl,

    /// <summary>sp3 carbon next to an aromatic ring (–CH2Ar).</summary>
    BenzylicAlkyl,

    /// <summary>sp3 carbon carrying oxygen (–CH2O–).</summary>
    OxyAlkyl,

    /// <summary>sp3 carbon carrying nitrogen (–CH2N&lt;).</summary>
    AminoAlkyl,

    /// <summary>sp3 carbon carrying sulfur (–CH2S–).</summary>
    ThioAlkyl,

    /// <summary>sp3 carbon carrying one halogen (–CH2Cl, –CH2Br, –CH2I).</summary>
    HaloAlkyl,

    /// <summary>sp3 carbon next to a carbonyl or nitrile (–CH2C(=O)–, –CH2CN).</summary>
    CarbonylAlkyl,

    /// <summary>sp3 carbon carrying two or three F or Cl/Br (–CF3, –CCl3, –CHF2).</summary>
    Trihalomethyl,

    /// <summary>Non-aromatic C=C.</summary>
    Alkenyl,

    /// <summary>C≡C.</summary>
    Alkynyl,

    /// <summary>Aromatic carbon (phenyl, or a heteroaryl bonded through a carbon not next to a ring N).</summary>
    Aryl,

    /// <summary>Aromatic carbon next to a pyridine-type ring N (2-pyridyl, 2-thiazolyl …).</summary>
    AzinylCarbon,

    /// <summary>–C≡N.</summary>
    Nitrile,

    /// <summary>–CHO.</summary>
    Formyl,

    /// <summary>–C(=O)R, R alkyl (ketone; thioketone approximated).</summary>
    Acyl,

    /// <summary>–C(=O)Ar.</summary>
    Aroyl,

    /// <summary>–COOH.</summary>
    Carboxyl,

    /// <summary>–COO⁻.</summary>
    Carboxylate,

    /// <summary>–C(=O)OR.</summary>
    Ester,

    /// <summary>–C(=O)N&lt; (the amide carbon side).</summary>
    AmideCarbon,

    /// <summary>–C(=O)X, X halogen.</summary>
    AcylHalide,

    /// <summary>–C(=N–)R (imine, oxime, hydrazone carbon).</summary>
    IminoCarbon,

    /// <summary>–NH2 on a saturated or aromatic carbon.</summary>
    PrimaryAmine,

    /// <summary>–NHR, –NR2 with R alkyl.</summary>
    Amine,

    /// <summary>–N&lt; carrying an aryl or vinyl besides the atom it is attached to (–NHPh).</summary>
    ArylAmine,

    /// <summary>–N&lt; of an amide, carbamate, urea or imide (–NHC(=O)R).</summary>
    AmideNitrogen,

    /// <summary>–N&lt; of a sulfonamide (–NHSO2R).</summary>
    SulfonamideNitrogen,

    /// <summary>Positively charged or four-coordinate nitrogen (–NR3⁺).</summary>
    Ammonium,

    /// <summary>–NO2.</summary>
    Nitro,

    /// <summary>Ring nitrogen of an aromatic ring, the group being N-linked (1-pyrazolyl, 1-indolyl …).</summary>
    HeteroarylNitrogen,

    /// <summary>–N=C&lt; (imine nitrogen, azo).</summary>
    IminoNitrogen,

    /// <summary>–N3.</summary>
    Azide,

    /// <summary>–OH.</summary>
    Hydroxyl,

    /// <summary>–O⁻.</summary>
    Oxide,

    /// <summary>–OR, R alkyl or silyl.</summary>
    Alkoxy,

    /// <summary>–OAr.</summary>
    Aryloxy,

    /// <summary>–O–C=C (enol ether).</summary>
    VinylOxy,

    /// <summary>–OC(=O)R (ester oxygen, carbonate, carbamate oxygen).</summary>
    Acyloxy,

    /// <summary>–OC(=O)Ar or –OC(=O)C=C (conjugated acyl; Beauchamp–Marquez ArCO2- row).</summary>
    Aroyloxy,

    /// <summary>–OSO2R (sulfonate ester oxygen).</summary>
    Sulfonyloxy,

    /// <summary>–O–N, –O–P, –O–B and similar.</summary>
    HeteroOxy,

    /// <summary>–SH.</summary>
    Thiol,

    /// <summary>–SR.</summary>
    Sulfide,

    /// <summary>–SC(=O)R.</summary>
    ThioEster,

    /// <summary>–S(=O)R.</summary>
    Sulfinyl,

    /// <summary>–SO2R, –SO2N&lt;, –SO2O–.</summary>
    Sulfonyl,

    /// <summary>–F.</summary>
    Fluoro,

    /// <summary>–Cl.</summary>
    Chloro,

    /// <summary>–Br.</summary>
    Bromo,

    /// <summary>–I.</summary>
    Iodo,

    /// <summary>–SiR3.</summary>
    Silyl,

    /// <summary>–BR2 (boronic acid or ester).</summary>
    Boryl,

    /// <summary>–PR2.</summary>
    Phosphino,

    /// <summary>–P(=O)R2, –P(=O)(OR)2.</summary>
    Phosphoryl,
}
