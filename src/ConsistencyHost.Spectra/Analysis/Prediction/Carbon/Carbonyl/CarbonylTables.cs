namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>
/// Carbonyl carbons by type and side (ppm, CDCl3). Side order: CH2, CH, C(q), aryl, 5-ring heteroaryl, 6-ring
/// heteroaryl, vinyl, alkynyl, acyl, CF2/CF3, other.
/// </summary>
/// <remarks>
/// From memory of the carbonyl tables of Pretsch, Bühlmann and Badertscher (2009) and Kalinowski, Berger and
/// Braun (1988), each row read off its parents: ketones — acetone 207.1 (Gottlieb 1997: 207.07), 2-butanone 209.3,
/// 3-methyl-2-butanone 212.5, pinacolone 213.5, acetophenone 198.1, 2-acetylthiophene 190.7, 2-acetylfuran 186.8,
/// 2-acetylpyridine 200.1, methyl vinyl ketone 198.5, 4-phenylbut-3-yn-2-one 184.7, 2,3-butanedione 197.4, benzil
/// 194.6 and ethyl benzoylformate 186.4 (acyl side −8, wide),
/// trifluoroacetophenone 180.5; aldehydes — acetaldehyde 200.5, propanal 202.8, isobutyraldehyde 204.9,
/// pivalaldehyde 205.6, benzaldehyde 192.2, furfural 177.8, thiophene-2-carbaldehyde 183.0, pyridine-2-carbaldehyde
/// 193.4, cinnamaldehyde 193.7, propynal 176.8; acids — acetic 176.0 (Gottlieb 1997: 175.99), hexanoic 180.6,
/// isobutyric 184.0, pivalic 185.9, benzoic 172.6, acrylic 171.6, 2-furoic 163.5; esters — ethyl acetate 171.4
/// (Gottlieb 1997: 171.36), methyl hexanoate 174.2, methyl isobutyrate 177.3, methyl pivalate 178.7, methyl
/// benzoate 167.0, methyl 2-furoate 159.1, methyl nicotinate 165.7, methyl acrylate 166.5, methyl propiolate 153.0,
/// diethyl oxalate 157.8, ethyl trifluoroacetate 157.4; amides (N-alkyl) — N-methylacetamide 170.2, propanamides
/// 173.5, isobutyramides 176.5, pivalamides 178.3, N-alkylbenzamides 167.5, furan-2-carboxamides 158.3, picolinamides
/// 164.2, acrylamides 165.6, propiolamides 153, α-ketoamides 161, trifluoroacetamides 157.3; acid chlorides — acetyl
/// chloride 170.4, butanoyl chloride 173.8, benzoyl chloride 168.4; thioesters (S-alkyl) — S-ethyl thioacetate
/// 195.6, S-alkyl thiobenzoates 192.0; anhydrides — acetic anhydride 166.7, benzoic anhydride 162.3.
/// </remarks>
internal static class CarbonylTables
{
    public static readonly CarbonylSideTable Ketone = new("ketone C=O", 207.0,
        [2.4, 5.6, 6.8, -8.9, -18.0, -7.5, -8.5, -22.3, -8.0, -17.6, -5.0], 4.0);

    public static readonly CarbonylSideTable Aldehyde = new("aldehyde C=O", 200.5,
        [2.3, 4.4, 5.1, -8.3, -19.0, -7.0, -6.8, -23.7, -10.0, -16.0, -5.0], 3.5);

    public static readonly CarbonylSideTable Acid = new("acid C=O", 176.5,
        [3.9, 7.0, 9.0, -4.2, -9.0, -7.0, -4.7, -19.0, -11.0, -14.0, -4.0], 3.5);

    public static readonly CarbonylSideTable Ester = new("ester C=O", 171.2,
        [3.0, 5.9, 7.5, -4.3, -10.5, -5.5, -4.6, -18.2, -13.0, -13.8, -4.0], 2.8);

    public static readonly CarbonylSideTable Amide = new("amide C=O", 170.2,
        [3.3, 6.3, 8.1, -2.7, -8.5, -6.0, -4.6, -17.0, -9.0, -12.9, -4.0], 3.0);

    public static readonly CarbonylSideTable AcidHalide = new("acid halide C=O", 170.4,
        [3.4, 7.0, 9.5, -2.0, -8.0, -5.0, -4.5, -18.0, -10.0, -14.0, -5.0], 3.5);

    public static readonly CarbonylSideTable Thioester = new("thioester C=O", 195.6,
        [4.0, 8.0, 11.0, -3.6, -10.0, -5.0, -5.5, -20.0, -10.0, -15.0, -6.0], 4.0);

    public static readonly CarbonylSideTable Anhydride = new("anhydride C=O", 166.7,
        [3.0, 5.5, 7.0, -4.4, -10.0, -5.0, -4.5, -17.0, -10.0, -12.0, -5.0], 3.5);

    /// <summary>Change when the carbonyl carbon lies in a ring of <paramref name="size"/> atoms, by type.</summary>
    /// <remarks>From memory: cyclobutanone 208.9, cyclopentanone 219.6, cyclohexanone 211.9, cycloheptanone 215.1;
    /// β-propiolactone 168.3, γ-butyrolactone 177.9, δ-valerolactone 171.3, ε-caprolactone 176.1; azetidin-2-ones
    /// 166–169, 2-pyrrolidinone 179.4 (N-methyl 175.0), 2-piperidinone 172.5, caprolactam 179.5.</remarks>
    public static double Ring(CarbonylSideTable table, int size)
    {
        if (ReferenceEquals(table, Ketone))
        {
            return size switch { 0 => 0, 3 => -5, 4 => -2.8, 5 => 7.5, 6 => -0.5, 7 => 3.4, _ => 2.0 };
        }

        if (ReferenceEquals(table, Ester))
        {
            return size switch { 0 => 0, 4 => -5.8, 5 => 3.8, 6 => -2.8, 7 => 2.0, _ => 0 };
        }

        if (ReferenceEquals(table, Amide))
        {
            return size switch { 0 => 0, 4 => -5.0, 5 => 4.2, 6 => -1.5, 7 => 5.0, _ => 0 };
        }

        return size switch { 0 => 0, 5 => 1.5, 6 => -2.0, _ => 0 };
    }
}
