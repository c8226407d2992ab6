namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// CHX3 and CH2X2 (X = Cl, Br, I): small molecules where additivity fails and whose acidic C–H moves strongly
/// with the solvent's hydrogen-bond acceptance (CHCl3 7.26 in CDCl3, 8.32 in DMSO-d6).
/// </summary>
/// <remarks>
/// CHCl3 and CH2Cl2 in CDCl3 and DMSO-d6: Gottlieb, Kotlyar &amp; Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1
/// (read; the same cells are in the impurity table of this library). Their acetone-d6, C6D6, CD3CN, CD3OD and D2O
/// cells, and the bromo and iodo parents, are from memory of the same table and of Pretsch, Bühlmann &amp;
/// Badertscher 2009.
/// </remarks>
internal static class HalomethaneShifts
{
    /// <summary>The tabulated shift for a carbon carrying only halogens and H, or null.</summary>
    /// <param name="hydrogens">1 or 2.</param>
    /// <param name="halogen">The halogen's atomic number (all halogens on the carbon equal).</param>
    /// <param name="solvent">Canonical solvent name or null.</param>
    public static double? Of(int hydrogens, int halogen, string? solvent) => (hydrogens, halogen) switch
    {
        (1, 17) => Chloroform(solvent),
        (2, 17) => Dichloromethane(solvent),
        (1, 35) => 6.82,   // CHBr3, CDCl3 (memory)
        (2, 35) => 4.94,   // CH2Br2, CDCl3 (memory)
        (2, 53) => 3.90,   // CH2I2, CDCl3 (memory)
        _ => null,
    };

    private static double Chloroform(string? solvent) => solvent switch
    {
        "DMSO-d6" => 8.32,
        "acetone-d6" => 8.02,
        "CD3CN" => 7.58,
        "CD3OD" => 7.90,
        "C6D6" or "toluene-d8" => 6.15,
        "THF-d8" => 7.89,
        "CD2Cl2" => 7.32,
        _ => 7.26,
    };

    private static double Dichloromethane(string? solvent) => solvent switch
    {
        "DMSO-d6" => 5.76,
        "acetone-d6" => 5.63,
        "CD3CN" => 5.44,
        "CD3OD" => 5.49,
        "C6D6" or "toluene-d8" => 4.27,
        "THF-d8" => 5.51,
        "CD2Cl2" => 5.32,
        _ => 5.30,
    };
}
