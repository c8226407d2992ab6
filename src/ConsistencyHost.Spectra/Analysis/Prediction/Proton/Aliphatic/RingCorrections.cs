namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// Corrections for sp3 C–H in small and common rings, which the open-chain increments do not know.
/// </summary>
/// <remarks>
/// Derived as (parent ring shift − open-chain increment estimate) from parent rings, from memory of Pretsch,
/// Bühlmann &amp; Badertscher 2009: cyclopropane 0.22, oxirane 2.54, aziridine 1.62 (3-ring ≈ −0.9);
/// cyclobutane 1.96, oxetane 4.73/2.72, azetidine 3.6 (4-ring ≈ +0.8); cyclopentane 1.51, tetrahydrofuran
/// 3.75/1.85 (Gottlieb 1997: 3.76/1.85), pyrrolidine 2.87/1.68 (5-ring ≈ +0.3); cyclohexane 1.43, tetrahydropyran
/// 3.57/1.59, 1,4-dioxane 3.71 (Gottlieb 1997), piperidine 2.79 (6-ring ≈ +0.15). The half-width covers the spread
/// between these parents and the axial/equatorial split of ring CH2 (≈ 0.4–0.6 ppm in cyclohexanes, so ±0.25 in
/// six-rings).
/// </remarks>
internal static class RingCorrections
{
    /// <summary>(correction, half-width) for the smallest ring holding the carbon; (0, 0) outside rings.</summary>
    /// <param name="size">Ring size, 0 outside rings.</param>
    /// <param name="ringOxygenNext">True when a ring oxygen is bonded to the carbon (oxetane OCH2 needs more).</param>
    public static (double Delta, double HalfWidth) ForRing(int size, bool ringOxygenNext) => size switch
    {
        0 => (0, 0),
        3 => (-0.9, 0.35),
        4 when ringOxygenNext => (1.3, 0.4),
        4 => (0.6, 0.45),
        5 => (0.3, 0.15),
        6 => (0.15, 0.25),
        _ => (0.2, 0.15),
    };
}
