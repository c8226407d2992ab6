using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Unsaturated;

/// <summary>
/// 13C increments for alkene carbons: δ(C1) = 123.3 + Σ Z(own carbon) + Σ Z(other carbon) + steric corrections.
/// </summary>
/// <remarks>
/// Alkyl terms and steric corrections: Glagovich (CCSU, "13C chemical shift calculations for linear and branched
/// alkenes", 13cpredictalkene.html): own side α 10.6, β 7.2, γ −1.5; other side α′ −7.9, β′ −1.8, γ′ +1.5;
/// cis (Z) pair −1.1, two α on the observed carbon −4.8, two α′ +2.5, two or more β +2.3.
/// Functional groups (own, other), from memory of Pretsch, Bühlmann and Badertscher (2009), each read off its
/// parent (CDCl3): styrene 136.9/113.7, 1,3-butadiene 137.2/117.5, acrolein 136.0/136.4, methyl vinyl ketone
/// 137.1/128.0, acrylic acid 128.0/132.8, methyl acrylate 128.3/130.6, acrylamide 131.9/125.6 (DMSO),
/// acrylonitrile 107.8/137.5, ethyl vinyl ether 151.8/86.3, vinyl acetate 141.2/96.6, vinyl fluoride 148.2/89.0,
/// vinyl chloride 126.1/117.2, vinyl bromide 114.7/122.4, vinyl iodide 85.2/130.3, nitroethylene 145.7/122.4,
/// vinyltrimethylsilane 139.1/130.9.
/// </remarks>
internal static class AlkeneIncrements
{
    public const double Base = 123.3;
    public static readonly double[] OwnAlkyl = [0, 10.6, 7.2, -1.5];
    public static readonly double[] OtherAlkyl = [0, -7.9, -1.8, 1.5];
    public static readonly string[] OwnAlkylLabels = ["", "α C", "β C", "γ C"];
    public static readonly string[] OtherAlkylLabels = ["", "α′ C", "β′ C", "γ′ C"];

    private static readonly (double Own, double Other, double Spread)[] Rows = Build();
    private static readonly string[] OwnLabels = GroupNames.Prefixed("gem");
    private static readonly string[] OtherLabels = GroupNames.Prefixed("vic");

    /// <summary>The increment of <paramref name="group"/> on the observed carbon.</summary>
    public static double Own(Group group) => Rows[(int)group].Own;

    /// <summary>The increment of <paramref name="group"/> on the other alkene carbon.</summary>
    public static double Other(Group group) => Rows[(int)group].Other;

    /// <summary>The row's own uncertainty.</summary>
    public static double Spread(Group group) => Rows[(int)group].Spread;

    /// <summary>Label of <paramref name="group"/> on the observed carbon ("gem-OR").</summary>
    public static string OwnLabel(Group group) => OwnLabels[(int)group];

    /// <summary>Label of <paramref name="group"/> on the other carbon ("vic-OR").</summary>
    public static string OtherLabel(Group group) => OtherLabels[(int)group];

    private static (double, double, double)[] Build()
    {
        var rows = new (double, double, double)[(int)Group.Other + 1];
        for (var i = 0; i < rows.Length; i++)
        {
            rows[i] = (10.0, -5.0, 8.0);
        }

        void Set(Group g, double own, double other, double spread) => rows[(int)g] = (own, other, spread);
        Set(Group.Alkyl, 10.6, -7.9, 0);
        Set(Group.Trifluoromethyl, 7.0, 0.5, 3.0);
        Set(Group.Aryl, 13.6, -9.6, 1.5);
        Set(Group.Vinyl, 13.9, -5.8, 2.0);
        Set(Group.Alkynyl, -6.0, 5.0, 4.0);
        Set(Group.Formyl, 12.7, 13.1, 2.5);
        Set(Group.Acyl, 13.8, 4.7, 2.5);
        Set(Group.CarboxylicAcid, 4.7, 9.5, 2.5);
        Set(Group.Carboxylate, 9.0, 3.0, 4.0);
        Set(Group.Ester, 5.0, 7.3, 2.0);
        Set(Group.Amide, 8.6, 2.3, 3.0);
        Set(Group.AcylHalide, 8.0, 12.0, 4.0);
        Set(Group.Nitrile, -15.5, 14.2, 2.0);
        Set(Group.Imidoyl, 13.0, 1.0, 4.0);
        Set(Group.Thioacyl, 15.0, 2.0, 6.0);
        Set(Group.Alkoxy, 28.5, -37.0, 3.0);
        Set(Group.Aryloxy, 26.0, -28.0, 4.0);
        Set(Group.Silyloxy, 26.0, -33.0, 4.0);
        Set(Group.Hydroxy, 25.0, -30.0, 6.0);
        Set(Group.Acyloxy, 17.9, -26.7, 2.5);
        Set(Group.Sulfonyloxy, 20.0, -22.0, 5.0);
        Set(Group.Amino, 26.0, -30.0, 6.0);
        Set(Group.AlkylAmino, 27.0, -31.0, 6.0);
        Set(Group.DialkylAmino, 28.0, -32.0, 6.0);
        Set(Group.Amido, 10.0, -20.0, 6.0);
        Set(Group.DialkylAmido, 10.0, -20.0, 6.0);
        Set(Group.AzoleNitrogen, 8.0, -18.0, 6.0);
        Set(Group.Nitro, 22.4, -0.9, 3.0);
        Set(Group.Sulfide, 13.0, -12.0, 5.0);
        Set(Group.Sulfonyl, 14.5, 6.0, 4.0);
        Set(Group.Sulfinyl, 20.0, 0.0, 6.0);
        Set(Group.Fluoro, 24.9, -34.3, 2.5);
        Set(Group.Chloro, 2.8, -6.1, 2.0);
        Set(Group.Bromo, -8.6, -0.9, 2.5);
        Set(Group.Iodo, -38.1, 7.0, 4.0);
        Set(Group.Silyl, 15.8, 7.6, 3.0);
        Set(Group.Boron, 10.0, 10.0, 10.0);
        Set(Group.Phosphorus, 8.0, 8.0, 8.0);
        return rows;
    }
}
