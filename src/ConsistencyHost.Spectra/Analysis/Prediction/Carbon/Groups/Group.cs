namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

/// <summary>
/// A substituent as the increment tables name it, seen from the carbon it is attached to (an sp3 carbon, a ring
/// carbon or an alkene carbon). The same classification feeds the alkane, benzene, alkene and alkyne tables.
/// </summary>
internal enum Group : byte
{
    /// <summary>An sp3 carbon (the alkyl skeleton of the Grant–Paul walk).</summary>
    Alkyl,
    /// <summary>CF3 (its β-fluorines do not add up; it is taken as a group).</summary>
    Trifluoromethyl,
    /// <summary>An aromatic carbon (phenyl, heteroaryl).</summary>
    Aryl,
    /// <summary>An alkene carbon (C=C, not aromatic).</summary>
    Vinyl,
    /// <summary>An alkyne carbon.</summary>
    Alkynyl,
    /// <summary>–CHO.</summary>
    Formyl,
    /// <summary>–C(=O)R, ketone side (also thioester and other acyl carbons with no closer match).</summary>
    Acyl,
    /// <summary>–COOH.</summary>
    CarboxylicAcid,
    /// <summary>–COO⁻.</summary>
    Carboxylate,
    /// <summary>–COOR.</summary>
    Ester,
    /// <summary>–C(=O)N.</summary>
    Amide,
    /// <summary>–COCl, –COBr, –COF.</summary>
    AcylHalide,
    /// <summary>–C≡N.</summary>
    Nitrile,
    /// <summary>–C(=N)– (imine, oxime, amidine carbon).</summary>
    Imidoyl,
    /// <summary>–C(=S)–.</summary>
    Thioacyl,
    /// <summary>–OH.</summary>
    Hydroxy,
    /// <summary>–O⁻.</summary>
    Alkoxide,
    /// <summary>–O–alkyl (also O–vinyl, O–N, O–P).</summary>
    Alkoxy,
    /// <summary>–O–aryl.</summary>
    Aryloxy,
    /// <summary>–O–C(=O)R (ester, carbonate and carbamate oxygen).</summary>
    Acyloxy,
    /// <summary>–O–SO2R.</summary>
    Sulfonyloxy,
    /// <summary>–O–SiR3.</summary>
    Silyloxy,
    /// <summary>–NH2.</summary>
    Amino,
    /// <summary>–NHR (R carbon or other).</summary>
    AlkylAmino,
    /// <summary>–NR2.</summary>
    DialkylAmino,
    /// <summary>–N⁺ (ammonium, not aromatic).</summary>
    Ammonium,
    /// <summary>–NH–C(=O) (secondary amide, carbamate, urea nitrogen).</summary>
    Amido,
    /// <summary>–NR–C(=O) (tertiary amide, carbamate, urea or imide nitrogen).</summary>
    DialkylAmido,
    /// <summary>–N–SO2R.</summary>
    Sulfonamido,
    /// <summary>A ring nitrogen of an aromatic ring (N-alkyl azole, N-aryl azole, pyridinium).</summary>
    AzoleNitrogen,
    /// <summary>–N=C (imine nitrogen).</summary>
    IminoNitrogen,
    /// <summary>–NO2.</summary>
    Nitro,
    /// <summary>–N3.</summary>
    Azido,
    /// <summary>–SH.</summary>
    Thiol,
    /// <summary>–SR (sulfide, thioester sulfur).</summary>
    Sulfide,
    /// <summary>–S(=O)R.</summary>
    Sulfinyl,
    /// <summary>–SO2R (sulfone, sulfonamide, sulfonate sulfur).</summary>
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
    /// <summary>Phosphorus (phosphine, phosphonate, phosphonium).</summary>
    Phosphorus,
    /// <summary>Boron (boronic acid or ester).</summary>
    Boron,
    /// <summary>Anything else (metals, Se, isocyanide, cumulated groups).</summary>
    Other,
}
