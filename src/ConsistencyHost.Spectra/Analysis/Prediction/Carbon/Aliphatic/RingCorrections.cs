namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>
/// Ring corrections (ppm) added to the Grant–Paul sum of a ring carbon, by the size of its smallest ring and whether
/// that ring holds a heteroatom.
/// </summary>
/// <remarks>
/// Derived here as (parent ring shift) − (Grant–Paul sum with each atom counted once at its shortest distance).
/// Parent shifts, from memory of Pretsch, Bühlmann and Badertscher, Structure Determination of Organic Compounds,
/// 4th ed. (2009): cyclopropane −2.8, cyclobutane 22.4, cyclopentane 25.8, cyclohexane 27.1, cycloheptane 28.4,
/// cyclooctane 26.8; oxirane 40.6, aziridine 18.2, thiirane 18.9; oxetane 72.6/22.9; tetrahydrofuran 68.0/25.6
/// (Gottlieb 1997), pyrrolidine 47.0/25.7; tetrahydropyran 68.6/26.9/23.8, piperidine 47.5/27.2/25.2.
/// Heterocycle values are averaged over ring positions (their spread, ±1.5 ppm, is in the window).
/// A five-ring carbon bonded to a fused arene carbon takes its own value, derived the same way from benzo-fused
/// parents (from memory, SDBS/Pretsch): indane C-1 32.9, 2,3-dihydrobenzofuran C-3 29.8, indoline C-3 29.9, 1-indanone
/// C-3 25.8 against sums of 33.7, 33.4, 34.9 and 27.9: −0.8 to −5.0, mean −2.9. The cyclopentane value (−8.9) would
/// put indane C-1 near 25 ppm, because the aryl increment already carries the ring's own atoms.
/// </remarks>
internal static class RingCorrections
{
    /// <summary>The correction for a carbon whose smallest ring has <paramref name="size"/> atoms.</summary>
    /// <param name="size">Ring size (0 = not in a ring).</param>
    /// <param name="heteroElement">The ring's heteroatom element (0 = carbocycle).</param>
    public static double Of(int size, int heteroElement) => size switch
    {
        0 => 0,
        3 => heteroElement switch { 0 => -18.7, 8 => -24.2, 7 => -25.5, 16 => -8.3, _ => -20.0 },
        4 => heteroElement == 0 ? -2.6 : -1.5,
        5 => heteroElement == 0 ? -8.9 : -6.5,
        6 => heteroElement == 0 ? -5.1 : -3.5,
        7 => -1.3,
        _ => -3.0,
    };

    /// <summary>The correction for a five-ring carbon bonded to an arene carbon of the same ring (benzo-fused, benzylic).</summary>
    public const double FusedFiveRingBenzylic = -2.9;

    /// <summary>The label of <see cref="FusedFiveRingBenzylic"/>.</summary>
    public const string FusedFiveRingBenzylicLabel = "5-ring fused to an arene";

    /// <summary>The label of the correction.</summary>
    public static string Label(int size) => size switch
    {
        3 => "3-ring",
        4 => "4-ring",
        5 => "5-ring",
        6 => "6-ring",
        7 => "7-ring",
        _ => "large ring",
    };
}
