namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>
/// Grant–Paul steric corrections (ppm) for the observed sp3 carbon and each α sp3 carbon, by their degrees of
/// substitution (1 = primary … 4 = quaternary; every non-hydrogen neighbour counts).
/// </summary>
/// <remarks>
/// Source: Grant and Paul, J. Am. Chem. Soc. 1964, 86, 2984, as printed by Bacher (UCLA, Ccorralkane.html) and by
/// Glagovich (CCSU, 13cpredictalkane.html); secondary–quaternary −7.5 as both pages print it. Counting heteroatom
/// neighbours in the degree follows Pretsch's use of the table for substituted alkanes (from memory).
/// </remarks>
internal static class StericCorrections
{
    private static readonly double[,] Table =
    {
        { 0.0, 0.0, -1.1, -3.4 },
        { 0.0, 0.0, -2.5, -7.5 },
        { 0.0, -3.7, -9.5, -15.0 },
        { -1.5, -8.4, -15.0, -25.0 },
    };

    /// <summary>The correction for an observed carbon of <paramref name="observedDegree"/> bonded to an α carbon of <paramref name="attachedDegree"/>.</summary>
    public static double Of(int observedDegree, int attachedDegree) =>
        Table[Math.Clamp(observedDegree, 1, 4) - 1, Math.Clamp(attachedDegree, 1, 4) - 1];
}
