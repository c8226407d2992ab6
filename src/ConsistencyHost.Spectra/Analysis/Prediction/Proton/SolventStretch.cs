namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>
/// Solvent allowance for C–H windows built from CDCl3 data. Aromatic solvents shift protons near polar groups
/// upfield (DMF N-CH3 2.96/2.88 in CDCl3, 2.36/1.86 in C6D6; acetone 2.17 → 1.55), polar solvents move them by
/// about ±0.1–0.3 (2-propanol CH 4.04 in CDCl3, 3.78 in DMSO-d6).
/// </summary>
/// <remarks>Gottlieb, Kotlyar &amp; Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1 (CDCl3 and DMSO-d6 columns read;
/// the C6D6 values quoted here from memory of the same table).</remarks>
internal static class SolventStretch
{
    private static readonly string AromaticSolventNearPolar = "aromatic solvent: up to " + Ppm.Signed(-0.75) + " (solvent-induced shift)";
    private static readonly string AromaticSolvent = "aromatic solvent: up to " + Ppm.Signed(-0.4) + " (solvent-induced shift)";

    /// <summary>Stretches the window for <paramref name="solvent"/>.</summary>
    /// <param name="estimate">The window being built.</param>
    /// <param name="solvent">Canonical solvent name or null.</param>
    /// <param name="nearPolarGroup">True when a carbonyl, amide, sulfinyl, nitrile or heteroatom is on the carbon.</param>
    public static void Apply(ProtonEstimate estimate, string? solvent, bool nearPolarGroup)
    {
        switch (solvent)
        {
            case "CDCl3" or "CD2Cl2":
                return;
            case "C6D6" or "toluene-d8":
                estimate.Stretch(nearPolarGroup ? 0.75 : 0.4, 0.05, nearPolarGroup ? AromaticSolventNearPolar : AromaticSolvent);
                return;
            case "DMSO-d6":
                estimate.Stretch(0.1, 0.1, "DMSO-d6: ±0.10 against CDCl3 data");
                return;
            case "D2O" or "CD3OD":
                estimate.Stretch(0.15, 0.15, solvent, ": ±0.15 against CDCl3 data");
                return;
            case null:
                estimate.Stretch(0.1, 0.1, "solvent not given: ±0.10");
                return;
            default:
                estimate.Stretch(0.1, 0.1, solvent, ": ±0.10 against CDCl3 data");
                return;
        }
    }
}
