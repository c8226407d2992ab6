namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// 13C substituent increments on benzene (base 128.5 ppm): δ = 128.5 + Σ Z(ipso, ortho, meta, para).
/// </summary>
/// <remarks>
/// From memory of the monosubstituted-benzene table of Pretsch, Bühlmann and Badertscher, Structure Determination of
/// Organic Compounds, 4th ed. (2009) (after Ewing, Org. Magn. Reson. 1979, 12, 499), cross-read against the parent
/// shifts it rests on (CDCl3): toluene 137.8/129.2/128.4/125.6 (Gottlieb 1997: 137.89/129.07/128.26/125.33),
/// anisole 159.9/114.1/129.5/120.7, phenol 155.4/115.7/129.9/121.1, aniline 146.7/115.1/129.3/118.5,
/// nitrobenzene 148.3/123.5/129.4/134.7, benzonitrile 112.4/132.1/129.1/132.8, acetophenone 137.1/128.3/128.6/133.1,
/// methyl benzoate 130.2/129.6/128.4/132.9, fluorobenzene 163.3/115.6/129.9/124.0, chlorobenzene 134.7/128.9/129.8/
/// 126.6, bromobenzene 122.6/131.6/130.0/126.9, iodobenzene 94.4/137.4/130.1/127.4, methyl phenylacetate
/// 134.0/129.3/128.6/127.1 and benzyl cyanide 129.9/127.9/129.1/127.9 (CH2C(=X)), diphenylmethane 141.1/128.9/128.5/
/// 126.1 (CH2Ar), 2-phenylfuran 130.9/123.9/128.7/127.4 and 2-phenylthiophene 134.4/126.0/128.9/127.5 (5-ring
/// heteroaryl), benzyl methyl ether 138.3/127.6/128.3/127.5, benzyl acetate 136.0/128.3/128.6/128.3, benzylamine
/// 143.3/127.1/128.5/126.8, N-alkylbenzylamines 140.4/128.1/128.4/126.9, N-benzylacetamide 138.3/127.8/128.7/127.5. A branched
/// benzylic carbon adds to ipso and takes from ortho as the alkyl rows do (ethyl → isopropyl → tert-butyl:
/// +4.5/−1.5, +6.6/−2.9): 1-phenylethanol C-1 145.8. Each row carries a spread for its own uncertainty and for the
/// family it stands for.
/// </remarks>
internal static class BenzeneIncrements
{
    public const double Base = 128.5;

    public static readonly RingIncrement Methyl = new(9.3, 0.7, -0.1, -2.9, "CH3", 0);
    public static readonly RingIncrement PrimaryAlkyl = new(15.6, -0.5, 0.0, -2.6, "CH2R", 0.5);
    public static readonly RingIncrement SecondaryAlkyl = new(20.1, -2.0, 0.0, -2.5, "CHR2", 0.8);
    public static readonly RingIncrement TertiaryAlkyl = new(22.2, -3.4, -0.4, -3.1, "CR3", 0.8);
    public static readonly RingIncrement OxyMethyl = new(12.4, -1.2, 0.2, -1.1, "CH2OH", 1.0);
    public static readonly RingIncrement EtherMethyl = new(9.8, -0.9, -0.2, -1.0, "CH2OR", 1.0);
    public static readonly RingIncrement EsterMethyl = new(7.5, -0.2, 0.1, -0.2, "CH2OC(O)", 1.0);
    public static readonly RingIncrement AminoMethyl = new(14.8, -1.4, -0.2, -2.0, "CH2NH2", 1.0);
    public static readonly RingIncrement AlkylAminoMethyl = new(11.9, -0.4, -0.1, -1.6, "CH2NR", 1.5);
    public static readonly RingIncrement AmidoMethyl = new(9.8, -0.7, 0.2, -1.0, "CH2NC(O)", 1.5);
    public static readonly RingIncrement HaloMethyl = new(9.1, 0.0, 0.2, -0.2, "CH2X", 1.0);
    public static readonly RingIncrement AcylMethyl = new(5.5, 0.8, 0.1, -1.4, "CH2C(=X)", 2.5);
    public static readonly RingIncrement ArylMethyl = new(12.4, 0.4, 0.0, -2.4, "CH2Ar", 1.0);
    public static readonly RingIncrement Trifluoromethyl = new(2.6, -3.1, 0.4, 3.4, "CF3", 0.5);
    public static readonly RingIncrement Aryl = new(13.0, -1.1, 0.5, -1.0, "aryl", 1.5);
    public static readonly RingIncrement FiveRingHeteroaryl = new(4.5, -3.5, 0.3, -1.2, "5-ring heteroaryl", 3.0);
    public static readonly RingIncrement Vinyl = new(9.1, -2.4, 0.2, -0.5, "vinyl", 2.0);
    public static readonly RingIncrement Alkynyl = new(-6.2, 3.6, -0.4, -0.3, "alkynyl", 0.8);
    public static readonly RingIncrement Fluoro = new(34.8, -12.9, 1.4, -4.5, "F", 0.5);
    public static readonly RingIncrement Chloro = new(6.2, 0.4, 1.3, -1.9, "Cl", 0.5);
    public static readonly RingIncrement Bromo = new(-5.8, 3.2, 1.6, -1.6, "Br", 0.5);
    public static readonly RingIncrement Iodo = new(-34.1, 8.9, 1.6, -1.1, "I", 1.0);
    public static readonly RingIncrement Hydroxy = new(26.9, -12.8, 1.4, -7.4, "OH", 0.8);
    public static readonly RingIncrement Alkoxy = new(31.4, -14.4, 1.0, -7.7, "OR", 0.5);
    public static readonly RingIncrement Aryloxy = new(28.8, -9.6, 1.3, -5.2, "OAr", 1.0);
    public static readonly RingIncrement Acyloxy = new(22.4, -7.1, 0.4, -3.2, "OC(O)R", 0.8);
    public static readonly RingIncrement Sulfonyloxy = new(21.0, -6.5, 1.5, -0.5, "OSO2R", 1.5);
    public static readonly RingIncrement Oxide = new(39.6, -8.2, 1.9, -13.6, "O⁻", 2.0);
    public static readonly RingIncrement Amino = new(18.2, -13.4, 0.8, -10.0, "NH2", 0.8);
    public static readonly RingIncrement AlkylAmino = new(20.9, -16.1, 0.7, -11.3, "NHR", 1.0);
    public static readonly RingIncrement DialkylAmino = new(22.2, -15.8, 0.5, -11.8, "NR2", 1.0);
    public static readonly RingIncrement Acetamido = new(9.5, -8.5, 0.4, -4.2, "NHC(O)R", 0.8);
    public static readonly RingIncrement TertiaryAmido = new(16.2, -1.3, 1.2, -0.8, "N(R)C(O)R", 2.0);
    public static readonly RingIncrement Sulfonamido = new(8.5, -7.8, 1.2, -3.1, "NHSO2R", 2.0);
    public static readonly RingIncrement AzoleNitrogen = new(12.0, -8.0, 1.0, -2.5, "N(azole)", 2.0);
    public static readonly RingIncrement Imino = new(23.6, -7.6, 0.6, -2.6, "N=C", 1.5);
    public static readonly RingIncrement Azido = new(11.5, -9.5, 1.2, -3.6, "N3", 1.5);
    public static readonly RingIncrement Ammonium = new(19.5, -7.5, 1.5, 1.5, "N⁺", 3.0);
    public static readonly RingIncrement Nitro = new(19.8, -5.0, 0.9, 6.2, "NO2", 0.5);
    public static readonly RingIncrement Nitrile = new(-16.1, 3.6, 0.6, 4.3, "CN", 0.5);
    public static readonly RingIncrement Formyl = new(7.9, 1.2, 0.5, 5.9, "CHO", 0.5);
    public static readonly RingIncrement Acyl = new(8.6, -0.2, 0.1, 4.6, "C(O)R", 1.0);
    public static readonly RingIncrement CarboxylicAcid = new(0.9, 1.8, 0.0, 5.4, "COOH", 1.0);
    public static readonly RingIncrement Carboxylate = new(8.0, 1.0, 0.0, 3.0, "COO⁻", 2.5);
    public static readonly RingIncrement Ester = new(1.7, 1.1, -0.1, 4.4, "COOR", 0.6);
    public static readonly RingIncrement Amide = new(5.4, -1.0, 0.0, 3.0, "C(O)N", 1.2);
    public static readonly RingIncrement AcylHalide = new(4.7, 2.7, 0.3, 6.6, "COCl", 1.0);
    public static readonly RingIncrement Imidoyl = new(7.7, 0.2, 0.1, 2.3, "C=N", 1.5);
    public static readonly RingIncrement Thiol = new(2.1, 0.7, 0.3, -3.2, "SH", 1.0);
    public static readonly RingIncrement Sulfide = new(10.0, -1.9, 0.3, -3.6, "SR", 1.0);
    public static readonly RingIncrement Sulfinyl = new(17.2, -5.0, 0.9, 2.5, "S(O)R", 1.5);
    public static readonly RingIncrement Sulfonyl = new(12.1, -1.2, 0.9, 5.0, "SO2R", 1.0);
    public static readonly RingIncrement SulfonylHetero = new(15.6, -2.4, 0.7, 4.4, "SO2X", 1.5);
    public static readonly RingIncrement Silyl = new(11.6, 4.9, -0.7, 0.4, "SiR3", 1.0);
    public static readonly RingIncrement Boryl = new(0.0, 6.3, -0.8, 2.7, "B(OR)2", 4.0);
    public static readonly RingIncrement Phosphorus = new(6.0, 4.2, 0.0, 2.0, "P", 3.0);
    public static readonly RingIncrement Other = new(5.0, 0.0, 0.0, 0.0, "other", 6.0);

    private static readonly Dictionary<RingIncrement, (RingIncrement Secondary, RingIncrement Tertiary)> BranchedRows =
        new[] { OxyMethyl, EtherMethyl, EsterMethyl, AminoMethyl, AlkylAminoMethyl, AmidoMethyl, HaloMethyl, AcylMethyl, ArylMethyl }
            .ToDictionary(r => r, r => (
                r with { Ipso = r.Ipso + 4.5, Ortho = r.Ortho - 1.5, Spread = r.Spread + 1.0 },
                r with { Ipso = r.Ipso + 6.6, Ortho = r.Ortho - 2.9, Spread = r.Spread + 1.5 }));

    /// <summary>The row for a benzylic CH (one more substituent) or C (two or more) of a CH2X row.</summary>
    public static RingIncrement Branched(RingIncrement row, int extraSubstituents) =>
        extraSubstituents <= 0 || !BranchedRows.TryGetValue(row, out var pair) ? row
        : extraSubstituents == 1 ? pair.Secondary : pair.Tertiary;
}
