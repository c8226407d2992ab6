using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Solvents;

/// <summary>
/// The water window of every solvent that has a water (or HOD) line in <see cref="ResidualSolventTable"/>, each with
/// its reason. The tables give one shift; water moves with concentration, temperature and the solutes' hydrogen
/// bonding, and only in known directions, so each window is the published value minus a small upfield tolerance and
/// plus a solvent-specific downfield one.
/// </summary>
/// <remarks>
/// Sources: Gottlieb, Kotlyar, Nudelman 1997 (shifts at 24 °C and the remarks on how water moves, read in a copy of
/// the paper's text, see the reference notes §1.1); Fulmer 2010 (values only). Tolerance sizes not printed in either
/// paper are marked common practice or from memory in each reason.
/// </remarks>
public static class WaterWindowTable
{
    /// <summary>
    /// Upfield of its tabulated value water only moves by the HOD isotope shift (HDO 3.30 vs H2O 3.33 in DMSO-d6 and 2.81
    /// vs 2.84 in acetone-d6: Gottlieb 1997 footnotes, from memory) and by a sample warmer than the tables' 24 °C (about
    /// −0.01 ppm/K, the slope of the HOD-in-D2O temperature law attributed to Gottlieb 1997, from memory): 0.03 + 5 K ×
    /// 0.0103 ≈ 0.08, rounded to 0.10. Hydrogen-bond acceptors only move water downfield (Gottlieb 1997).
    /// </summary>
    public const double UpfieldPpm = 0.10;

    private const string Upfield = "upfield only the HOD isotope shift (−0.03 ppm, Gottlieb 1997 footnotes, from memory) and up to 5 K above 24 °C (≈ −0.01 ppm/K, from memory): −0.10 ppm";

    // Declared before All: static initialisers run in text order.
    private static ShiftWindow NonPolar { get; } = new(UpfieldPpm, 0.50,
        "Gottlieb 1997: any hydrogen-bond acceptor in the sample moves water downfield, most in non-polar solvents; +0.50 ppm (common practice: water in CDCl3 samples of amines, alcohols or amides is commonly seen up to about 2.0 ppm, from memory); " + Upfield);

    private static ShiftWindow AcceptorSolvent { get; } = new(UpfieldPpm, 0.30,
        "the solvent itself accepts hydrogen bonds from water, so solutes move it less than in the non-polar solvents (Gottlieb 1997's remark read that way); +0.30 ppm for solutes and a wetter sample (common practice); " + Upfield);

    /// <summary>The window of each canonical solvent name (<see cref="SolventNames"/>).</summary>
    public static IReadOnlyDictionary<string, ShiftWindow> All { get; } = new Dictionary<string, ShiftWindow>(StringComparer.Ordinal)
    {
        ["CDCl3"] = NonPolar,
        ["C6D6"] = NonPolar,
        ["toluene-d8"] = NonPolar,
        ["CD2Cl2"] = new(UpfieldPpm, 0.30,
            "Fulmer 2010 tabulates 1.52 ppm without a remark on drift; CD2Cl2 was not among Gottlieb 1997's solvents, so it keeps the general +0.30 ppm downfield (common practice); " + Upfield),
        ["acetone-d6"] = AcceptorSolvent,
        ["CD3CN"] = AcceptorSolvent,
        ["THF-d8"] = AcceptorSolvent,
        ["DMSO-d6"] = new(UpfieldPpm, 0.15,
            "Gottlieb 1997: in DMSO water is already strongly hydrogen-bonded, so solutes hardly move it (H2O 3.33, HDO 3.30); +0.15 ppm keeps acid and concentration drift (from memory: 3.3–3.45 ppm across typical samples), so an O–CH or N–CH singlet at 3.5–3.6 ppm is not taken for water; " + Upfield),
        ["CD3OD"] = new(0.10, 0.10,
            "Gottlieb 1997 tabulates 4.87 ppm as the exchange-averaged O–H line of HDO and CD3OH: the solvent's own O–D sites (about 25 mol/L) outnumber a solute's O–H and N–H several hundredfold, so solutes hardly move it (from memory, the argument Gottlieb 1997 gives for HOD in D2O); ±0.10 ppm for temperature (≈ 0.01 ppm/K, from memory) and water content (common practice)"),
        ["D2O"] = new(0.05, 0.05,
            "Gottlieb 1997: HOD in D2O is remarkably solute- and pH-independent but moves with temperature; ±0.05 ppm is ±5 K about 24 °C at ≈ 0.01 ppm/K (the HOD temperature law attributed to Gottlieb 1997, from memory; the reference notes recommend 4.79 ± 0.05)"),
    };

    /// <summary>The window of a canonical solvent name; solvents without one get <see cref="General"/>.</summary>
    public static ShiftWindow For(string solvent) => All.TryGetValue(solvent, out var window) ? window : General;

    /// <summary>For a solvent this table does not name (none today: a test keeps every water line covered).</summary>
    public static ShiftWindow General { get; } = new(UpfieldPpm, 0.30, "no solvent-specific reason: +0.30 ppm downfield (common practice); " + Upfield);
}
