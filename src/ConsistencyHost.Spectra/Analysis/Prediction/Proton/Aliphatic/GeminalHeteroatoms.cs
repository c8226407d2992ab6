namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// Windows for an sp3 C–H carrying two or more O/N/S atoms (acetals, aminals, orthoesters, dithianes), where summing
/// α increments overshoots by 0.5–1.5 ppm (CH2(OMe)2 4.58 against 1.2 + 2.1 + 2.1 = 5.4).
/// </summary>
/// <remarks>Ranges from memory of the 1H overview charts of Pretsch, Bühlmann &amp; Badertscher, Structure
/// Determination of Organic Compounds, Springer 2009 (e.g. MOM OCH2O 4.6, 1,3-benzodioxole OCH2O 5.95, acetal CH
/// 4.3–4.9, benzylidene acetal CH 5.4–5.8, anomeric CH 4.3–5.5, nucleoside H-1' 5.7–6.3), widened to cover them.</remarks>
internal static class GeminalHeteroatoms
{
    /// <summary>(low, high, likely) for the counts of O, N and S on the carbon and its H count; null for fewer than two.</summary>
    public static (double Low, double High, double Likely)? Of(int oxygen, int nitrogen, int sulfur, int hydrogens)
    {
        if (oxygen + nitrogen + sulfur < 2)
        {
            return null;
        }

        var methylene = hydrogens >= 2;
        if (sulfur == 0 && nitrogen == 0)
        {
            if (oxygen >= 3) return (4.8, 5.8, 5.2);
            return methylene ? (4.3, 6.15, 4.9) : (4.1, 6.5, 5.0);
        }

        if (oxygen == 0 && nitrogen == 0) return methylene ? (3.3, 4.7, 3.9) : (3.7, 5.7, 4.6);
        if (sulfur == 0 && oxygen == 0) return methylene ? (3.2, 5.7, 4.3) : (3.8, 6.8, 5.2);
        return methylene ? (4.0, 6.0, 4.9) : (4.3, 6.8, 5.6);
    }
}
