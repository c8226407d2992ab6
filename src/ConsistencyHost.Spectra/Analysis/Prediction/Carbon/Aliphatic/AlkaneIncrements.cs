using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>
/// Substituent increments (ppm) for sp3 carbons: δC = −2.3 + Σ Z(α, β, γ, δ) + Σ steric corrections.
/// </summary>
/// <remarks>
/// Sources, per row (the last column):
/// P — the table of Pretsch et al. as printed by Bacher (UCLA, "13C chemical shifts of substituted alkanes",
///     chem.ucla.edu/~bacher/General/30BL/NMR/Ccorralkane.html), alkyl terms of Grant and Paul (J. Am. Chem. Soc.
///     1964, 86, 2984) as printed by Glagovich (CCSU, 13cpredictalkane.html);
/// S — from memory of the "terminal" increments of Silverstein, Webster and Kiemle, Spectrometric Identification of
///     Organic Compounds, 7th ed. (2005); used for C(O)R, where the printed P row (22.5, 3.0, −3.0) puts the CH2 of
///     2-butanone (36.9) 7.6 ppm too low;
/// M — from memory: α/β/γ read off textbook shifts of n-butyl and ethyl derivatives (e.g. Et2NH, Et3N, Bu2NH,
///     Bu3N, N-butylacetamide, N,N-diethylacetamide, butyl phenyl ether, butyl azide); wider windows.
/// R — rough (rare groups); much wider windows.
/// The last value is the extra half-width the row adds when the group is α (half of it when β).
/// </remarks>
internal static class AlkaneIncrements
{
    /// <summary>The alkyl (skeleton carbon) terms at α, β, γ, δ (Grant and Paul 1964).</summary>
    public static readonly double[] Alkyl = [0, 9.1, 9.4, -2.5, 0.3];

    /// <summary>Reason labels of the alkyl terms by position.</summary>
    public static readonly string[] AlkylLabels = ["", "α C", "β C", "γ C", "δ C"];

    private static readonly Row[] Rows = Build();
    private static readonly string[][] Labels = [[], GroupNames.Prefixed("α"), GroupNames.Prefixed("β"), GroupNames.Prefixed("γ"), GroupNames.Prefixed("δ")];

    /// <summary>The increment of <paramref name="group"/> at <paramref name="position"/> (1 = α … 4 = δ).</summary>
    public static double Value(Group group, int position) => Rows[(int)group].Z[position];

    /// <summary>The reason label of <paramref name="group"/> at <paramref name="position"/>.</summary>
    public static string Label(Group group, int position) => Labels[position][(int)group];

    /// <summary>Extra half-width when the group is α (the table's own uncertainty for the row).</summary>
    public static double Spread(Group group) => Rows[(int)group].Spread;

    private readonly record struct Row(double[] Z, double Spread);

    private static Row[] Build()
    {
        var rows = new Row[(int)Group.Other + 1];
        void Set(Group g, double a, double b, double c, double d, double spread) => rows[(int)g] = new Row([0, a, b, c, d], spread);

        Set(Group.Alkyl, 9.1, 9.4, -2.5, 0.3, 0);                 // P (Grant–Paul)
        Set(Group.Vinyl, 20.0, 6.9, -2.1, 0.4, 1.0);              // P
        Set(Group.Alkynyl, 4.4, 5.6, -3.4, -0.6, 1.0);            // P
        Set(Group.Aryl, 22.1, 9.3, -2.6, 0.3, 1.0);               // P
        Set(Group.Formyl, 29.9, -0.6, -2.7, 0, 1.0);              // P
        Set(Group.Acyl, 30.0, 1.0, -2.0, 0, 1.5);                 // S
        Set(Group.CarboxylicAcid, 20.1, 2.0, -2.8, 0, 1.0);       // P
        Set(Group.Carboxylate, 24.5, 3.5, -2.5, 0, 2.0);          // S
        Set(Group.Ester, 22.6, 2.0, -2.8, 0, 1.0);                // P
        Set(Group.Amide, 22.0, 2.6, -3.2, -0.4, 1.0);             // P
        Set(Group.AcylHalide, 33.1, 2.3, -3.6, 0, 1.5);           // P
        Set(Group.Nitrile, 3.1, 2.4, -3.3, -0.5, 1.0);            // P
        Set(Group.Imidoyl, 24.0, 2.0, -2.5, 0, 3.5);              // R
        Set(Group.Thioacyl, 33.0, 1.0, -2.0, 0, 4.0);             // R
        Set(Group.Trifluoromethyl, 16.0, -2.0, -2.0, 0, 3.5);     // R
        Set(Group.Hydroxy, 49.0, 10.1, -6.2, 0, 1.5);             // P
        Set(Group.Alkoxide, 49.0, 10.1, -6.2, 0, 4.0);            // R (as OH)
        Set(Group.Alkoxy, 58.0, 7.2, -5.8, 0, 1.5);               // P
        Set(Group.Aryloxy, 55.0, 6.5, -5.8, 0, 2.0);              // M
        Set(Group.Acyloxy, 54.0, 6.5, -6.0, 0, 1.5);              // P
        Set(Group.Sulfonyloxy, 56.5, 6.0, -6.0, 0, 2.5);          // M
        Set(Group.Silyloxy, 49.5, 10.0, -6.0, 0, 2.0);            // M
        Set(Group.Amino, 28.3, 11.3, -5.1, 0, 1.5);               // P (printed as –NR2; matches NH2 data)
        Set(Group.AlkylAmino, 36.9, 8.0, -4.6, 0, 2.0);           // M
        Set(Group.DialkylAmino, 40.5, 5.0, -4.6, 0, 2.0);         // M
        Set(Group.Ammonium, 30.7, 5.4, -7.2, -1.4, 2.5);          // P (–NR3+)
        Set(Group.Amido, 26.5, 7.0, -5.0, 0, 2.0);                // M
        Set(Group.DialkylAmido, 34.3, 6.0, -5.0, 0, 2.5);         // M (N,N-diethylacetamide 40/42, N-Boc-piperidine C-2 44.5)
        Set(Group.Sulfonamido, 28.5, 7.0, -5.0, 0, 2.5);          // M
        Set(Group.AzoleNitrogen, 33.0, 8.0, -5.0, 0, 3.0);        // M
        Set(Group.IminoNitrogen, 47.0, 6.0, -5.0, 0, 3.5);        // M
        Set(Group.Nitro, 61.6, 3.1, -4.6, -1.0, 1.5);             // P
        Set(Group.Azido, 37.0, 5.5, -5.0, 0, 2.0);                // M
        Set(Group.Thiol, 10.6, 11.4, -3.6, -0.4, 1.5);            // P
        Set(Group.Sulfide, 20.4, 6.2, -2.7, 0, 2.0);              // P (–SCH3)
        Set(Group.Sulfinyl, 38.0, 0.0, -3.0, 0, 3.0);             // M
        Set(Group.Sulfonyl, 38.5, -1.0, -3.0, 0, 3.0);            // M
        Set(Group.Fluoro, 70.1, 7.8, -6.8, 0, 1.5);               // P
        Set(Group.Chloro, 31.0, 10.0, -5.1, -0.5, 1.5);           // P
        Set(Group.Bromo, 18.9, 11.0, -3.8, -0.7, 1.5);            // P
        Set(Group.Iodo, -7.2, 10.9, -1.5, -0.9, 2.0);             // P
        Set(Group.Silyl, 2.5, 2.5, -1.0, 0, 3.5);                 // R
        Set(Group.Phosphorus, 11.0, 0.5, -2.0, 0, 4.0);           // R
        Set(Group.Boron, 0.0, 2.0, -2.0, 0, 5.0);                 // R
        Set(Group.Other, 10.0, 3.0, -2.0, 0, 8.0);                // R
        return rows;
    }
}
