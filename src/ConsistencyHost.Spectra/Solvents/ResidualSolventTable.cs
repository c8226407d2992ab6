using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Solvents;

/// <summary>Residual solvent and water lines per deuterated solvent.</summary>
/// <remarks>
/// 1H residual and water shifts of the seven original solvents: Gottlieb 1997 Table 1 (300 MHz, 24 °C), read in a
/// published reprint. CD2Cl2, THF-d8 and toluene-d8 and every 13C value: Fulmer 2010 Tables 1–2, read in a
/// transcription. Multiplicities: UCLA solvent notes, or the 2nI+1 rule for deuterium where marked FromMemory.
/// </remarks>
public static class ResidualSolventTable
{
    private static readonly DataSource G = new(SolventSources.Gottlieb1997, Provenance.Published);
    private static readonly DataSource F = new(SolventSources.Fulmer2010, Provenance.Transcription);
    private static readonly DataSource U = new(SolventSources.UclaSolventNotes, Provenance.Published);

    /// <summary>Every line, grouped by solvent.</summary>
    public static IReadOnlyList<ResidualSolventLine> Lines { get; } =
    [
        H("CDCl3", 7.26, "s", "CHCl3", G), W("CDCl3", 1.56, G), C("CDCl3", 77.16, "t", "CDCl3", F),
        H("DMSO-d6", 2.50, "quint", "CHD2S(O)CD3", G), W("DMSO-d6", 3.33, G), C("DMSO-d6", 39.52, "sept", "(CD3)2SO", F),
        H("CD3OD", 3.31, "quint", "CHD2OD", G), W("CD3OD", 4.87, G), C("CD3OD", 49.00, "sept", "CD3OD", F),
        H("D2O", 4.79, "s", "HOD", G),
        H("acetone-d6", 2.05, "quint", "CHD2C(O)CD3", G), W("acetone-d6", 2.84, G),
        C("acetone-d6", 29.84, "sept", "(CD3)2CO CD3", F), C("acetone-d6", 206.26, "s", "(CD3)2CO C=O", F),
        H("C6D6", 7.16, "s", "C6D5H", G), W("C6D6", 0.40, G), C("C6D6", 128.06, "t", "C6D6", F),
        H("CD3CN", 1.94, "quint", "CHD2CN", G), W("CD3CN", 2.13, G),
        C("CD3CN", 1.32, "sept", "CD3CN CD3", F), C("CD3CN", 118.26, "s", "CD3CN CN", F),
        H("CD2Cl2", 5.32, "t", "CHDCl2", U), W("CD2Cl2", 1.52, F), C("CD2Cl2", 53.84, "quint", "CD2Cl2", F),
        H("THF-d8", 1.72, "m", "THF-d7 (C3-H)", F), H("THF-d8", 3.58, "m", "THF-d7 (C2-H)", F), W("THF-d8", 2.46, F),
        C("THF-d8", 67.21, "quint", "C2/C5", F), C("THF-d8", 25.31, "quint", "C3/C4", F),
        H("toluene-d8", 2.08, "quint", "C6D5CHD2", F), H("toluene-d8", 6.97, "br s", "ring H", F),
        H("toluene-d8", 7.01, "br s", "ring H", F), H("toluene-d8", 7.09, "br s", "ring H", F), W("toluene-d8", 0.43, F),
        C("toluene-d8", 20.43, "sept", "CD3", F), C("toluene-d8", 125.13, "t", "C4", F), C("toluene-d8", 127.96, "t", "C3/C5", F),
        C("toluene-d8", 128.87, "t", "C2/C6", F), C("toluene-d8", 137.48, "s", "C1", F),
    ];

    /// <summary>The lines of one solvent (any spelling <see cref="SolventNames"/> knows) and nucleus.</summary>
    public static IEnumerable<ResidualSolventLine> For(string? solvent, Nucleus nucleus)
    {
        var name = SolventNames.Normalise(solvent);
        return Lines.Where(l => l.Solvent == name && l.Nucleus == nucleus);
    }

    private static ResidualSolventLine H(string solvent, double ppm, string mult, string species, DataSource source) =>
        new(solvent, Nucleus.H1, SolventLineKind.Residual, ppm, mult, species, source);

    private static ResidualSolventLine W(string solvent, double ppm, DataSource source) =>
        new(solvent, Nucleus.H1, SolventLineKind.Water, ppm, "s", "H2O/HOD", source);

    private static ResidualSolventLine C(string solvent, double ppm, string mult, string species, DataSource source) =>
        new(solvent, Nucleus.C13, SolventLineKind.Residual, ppm, mult, species, source);
}
