namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>
/// For one carbonyl type: the value with a methyl side and the change for each other side kind (ppm).
/// </summary>
/// <param name="Name">The type as reasons print it ("ester C=O").</param>
/// <param name="MethylSide">Shift with a CH3 side (acetone, acetic acid, ethyl acetate, N-alkylacetamide …).</param>
/// <param name="Sides">Change against CH3 for Primary, Secondary, Tertiary, Aryl, 5-ring heteroaryl, 6-ring
/// heteroaryl, Vinyl, Alkynyl, Acyl, Perfluoroalkyl, Other (order of <see cref="SideKind"/> after Methyl).</param>
/// <param name="HalfWidth">Base half-width of the type.</param>
internal sealed record CarbonylSideTable(string Name, double MethylSide, double[] Sides, double HalfWidth)
{
    private readonly string[] labels = Labels(Name);

    /// <summary>The change for <paramref name="kind"/> against a methyl side.</summary>
    public double Side(SideKind kind) => kind == SideKind.Methyl ? 0 : Sides[(int)kind - 1];

    /// <summary>The reason label for <paramref name="kind"/>.</summary>
    public string Label(SideKind kind) => labels[(int)kind];

    private static string[] Labels(string name)
    {
        string[] kinds = ["CH3", "CH2", "CH", "C(q)", "aryl", "5-ring heteroaryl", "6-ring heteroaryl", "vinyl", "alkynyl", "acyl", "CF2/CF3", "other"];
        var labels = new string[kinds.Length];
        for (var i = 0; i < kinds.Length; i++)
        {
            labels[i] = kinds[i] + " side";
        }

        return labels;
    }
}
