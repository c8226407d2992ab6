namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>
/// Solvent terms for 13C windows. The increment tables are for CDCl3; polar solvents move most carbons by up to
/// ±2 ppm and carboxylic acids by several ppm (hydrogen-bonded dimers in CDCl3 are broken up).
/// </summary>
/// <remarks>
/// Gottlieb et al. 1997 / Fulmer et al. 2010, CDCl3 against DMSO-d6: acetic acid C=O 175.99/171.93, ethanol CH2
/// 58.28/56.07, methanol 50.41/48.59, ethyl acetate C=O 171.36/170.31, acetone C=O 207.07/206.31. Acids in DMSO-d6
/// from memory: hexanoic 180.6 → 174.5, benzoic 172.6 → 167.3 (about −5); in CD3OD about −2.5 (from memory).
/// Ester and ketone carbonyls in CD3OD and D2O lie 1–4 ppm higher than in CDCl3 (from memory).
/// </remarks>
internal static class SolventEffects
{
    /// <summary>Shift and extra half-width for a carboxylic-acid carbonyl in <paramref name="solvent"/>.</summary>
    public static (double Shift, double Widen) Acid(string? solvent) => solvent switch
    {
        "CDCl3" or "CD2Cl2" or "C6D6" or "toluene-d8" => (0, 0.5),
        "DMSO-d6" => (-4.8, 1.5),
        "acetone-d6" or "CD3CN" or "THF-d8" => (-3.5, 2.0),
        "CD3OD" => (-2.5, 2.0),
        "D2O" => (0.5, 3.0),
        _ => (-2.4, 3.0),
    };

    /// <summary>Shift and extra half-width for other carbonyl carbons.</summary>
    public static (double Shift, double Widen) Carbonyl(string? solvent) => solvent switch
    {
        "CDCl3" or "CD2Cl2" or "C6D6" or "toluene-d8" => (0, 0),
        "DMSO-d6" => (-0.8, 0.5),
        "acetone-d6" or "CD3CN" or "THF-d8" => (0, 1.0),
        "CD3OD" => (1.2, 1.2),
        "D2O" => (2.5, 2.5),
        _ => (0, 1.0),
    };

    /// <summary>Extra half-width for any other carbon outside CDCl3.</summary>
    public static double Other(string? solvent) => solvent switch
    {
        "CDCl3" or "CD2Cl2" => 0,
        "C6D6" or "toluene-d8" or "acetone-d6" or "CD3CN" or "THF-d8" => 0.5,
        "DMSO-d6" or "CD3OD" => 0.8,
        "D2O" => 1.5,
        _ => 0.8,
    };
}
