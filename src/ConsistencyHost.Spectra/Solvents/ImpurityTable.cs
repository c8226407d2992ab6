using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Solvents;

/// <summary>Common laboratory impurities in CDCl3 and DMSO-d6.</summary>
/// <remarks>
/// Gottlieb 1997 Tables 1–2 and Fulmer 2010 Tables 1–2 (same numbers for these two solvents). Each row's code
/// gives the source of its four cells in the order 1H CDCl3, 1H DMSO-d6, 13C CDCl3, 13C DMSO-d6:
/// P = Gottlieb, read in a published reprint; T = Fulmer, read in a transcription; M = Gottlieb, from memory.
/// Water is not an impurity row here: it is a water line of <see cref="ResidualSolventTable"/>.
/// Known suspect cell (kept as printed): diethyl ether CH2 13C in DMSO-d6 = 62.05 (other solvents 65.9–66.9).
/// </remarks>
public static class ImpurityTable
{
    /// <summary>The impurities in table order.</summary>
    public static IReadOnlyList<Impurity> All { get; } =
    [
        I("acetic acid", "CC(=O)O",
            G("CH3", 3, "s", null, "PPTT", 2.10, 1.91, 20.81, 20.95), G("C=O", 0, "", null, "--TT", null, null, 175.99, 171.93),
            X("COOH", 1, "br s", "----", null, null)),
        I("acetone", "CC(C)=O", G("CH3", 6, "s", null, "PPTT", 2.17, 2.09, 30.92, 30.56), G("C=O", 0, "", null, "--TT", null, null, 207.07, 206.31)),
        I("acetonitrile", "CC#N", G("CH3", 3, "s", null, "PPTT", 2.10, 2.07, 1.89, 1.03), G("CN", 0, "", null, "--TT", null, null, 116.43, 117.91)),
        I("benzene", "c1ccccc1", G("CH", 6, "s", null, "PPTT", 7.36, 7.37, 128.37, 128.30)),
        I("tert-butyl methyl ether", "COC(C)(C)C",
            G("C(CH3)3", 9, "s", null, "PPMM", 1.19, 1.11, 26.99, 26.79), G("OCH3", 3, "s", null, "PPMM", 3.22, 3.08, 49.45, 48.70),
            G("C", 0, "", null, "--MM", null, null, 72.87, 72.04)),
        I("chloroform", "ClC(Cl)Cl", G("CH", 1, "s", null, "PPTT", 7.26, 8.32, 77.36, 79.16)),
        I("dichloromethane", "ClCCl", G("CH2", 2, "s", null, "PPTT", 5.30, 5.76, 53.52, 54.84)),
        I("diethyl ether", "CCOCC", G("CH3", 6, "t", 7, "PPTT", 1.21, 1.09, 15.20, 15.12), G("CH2", 4, "q", 7, "PPTT", 3.48, 3.38, 65.91, 62.05)),
        I("DMF", "CN(C)C=O",
            G("CHO", 1, "s", null, "PPTT", 8.02, 7.95, 162.62, 162.29), G("NCH3", 3, "s", null, "PPTT", 2.96, 2.89, 36.50, 35.73),
            G("NCH3'", 3, "s", null, "PPTT", 2.88, 2.73, 31.45, 30.73)),
        I("DMSO", "CS(C)=O", G("CH3", 6, "s", null, "PPMM", 2.62, 2.54, 40.76, 40.45)),
        I("1,4-dioxane", "C1COCCO1", G("CH2", 8, "s", null, "PPTT", 3.71, 3.57, 67.14, 66.36)),
        I("ethanol", "CCO",
            G("CH3", 3, "t", 7, "PPTT", 1.25, 1.06, 18.41, 18.51), G("CH2", 2, "q", 7, "PPTT", 3.72, 3.44, 58.28, 56.07),
            X("OH", 1, "s", "PP--", 1.32, 4.63)),
        I("ethyl acetate", "CCOC(C)=O",
            G("CH3C(O)", 3, "s", null, "PTTT", 2.05, 1.99, 21.04, 20.68), G("OCH2", 2, "q", 7, "PTTT", 4.12, 4.03, 60.49, 59.74),
            G("CH3", 3, "t", 7, "PTTT", 1.26, 1.17, 14.19, 14.40), G("C=O", 0, "", null, "--TT", null, null, 171.36, 170.31)),
        I("n-hexane", "CCCCCC",
            G("CH3", 6, "t", 7, "TTTT", 0.88, 0.86, 14.14, 13.88), G("CH2", 8, "m", null, "TTTT", 1.26, 1.25, 22.70, 22.05),
            G("C3/4", 0, "", null, "--TT", null, null, 31.64, 30.95)),
        I("methanol", "CO", G("CH3", 3, "s", null, "TTTT", 3.49, 3.16, 50.41, 48.59), X("OH", 1, "s", "TT--", 1.09, 4.01)),
        I("n-pentane", "CCCCC",
            G("CH3", 6, "t", 7, "TTTT", 0.88, 0.86, 14.08, 13.28), G("CH2", 6, "m", null, "TTTT", 1.27, 1.27, 22.38, 21.70),
            G("C3", 0, "", null, "--TT", null, null, 34.16, 33.48)),
        I("2-propanol", "CC(C)O",
            G("CH3", 6, "d", 6, "TTTT", 1.22, 1.04, 25.14, 25.43), G("CH", 1, "sept", 6, "TTTT", 4.04, 3.78, 64.50, 64.92),
            X("OH", 1, "s", "----", null, null)),
        I("pyridine", "c1ccncc1",
            G("H-2/6", 2, "m", null, "TTTT", 8.62, 8.58, 149.90, 149.58), G("H-3/5", 2, "m", null, "TTTT", 7.29, 7.39, 123.75, 123.84),
            G("H-4", 1, "m", null, "TTTT", 7.68, 7.79, 135.96, 136.05)),
        I("tetrahydrofuran", "C1CCOC1",
            G("OCH2", 4, "m", null, "TTTT", 3.76, 3.60, 67.97, 67.03), G("CH2", 4, "m", null, "TTTT", 1.85, 1.76, 25.62, 25.14)),
        I("toluene", "Cc1ccccc1",
            G("CH3", 3, "s", null, "TTTT", 2.36, 2.30, 21.46, 20.99), G("H-2/4/6", 3, "m", null, "TTTT", 7.17, 7.18, 129.07, 128.88),
            G("H-3/5", 2, "m", null, "TTTT", 7.25, 7.25, 128.26, 128.18), G("C4", 0, "", null, "--TT", null, null, 125.33, 125.29),
            G("C1", 0, "", null, "--TT", null, null, 137.89, 137.35)),
        I("triethylamine", "CCN(CC)CC", G("CH3", 9, "t", 7, "TTTT", 1.03, 0.93, 11.61, 11.74), G("CH2", 6, "q", 7, "TTTT", 2.53, 2.43, 46.25, 45.74)),
        I("grease", null, G("CH3", null, "m", null, "PT--", 0.86, 0.85, null, null), G("CH2", null, "br s", null, "PTT-", 1.26, 1.24, 29.71, null)),
        I("silicone grease", null, G("SiCH3", null, "s", null, "TTT-", 0.07, -0.06, 1.19, null)),
    ];

    /// <summary>The impurity with this name (case-insensitive), or null.</summary>
    public static Impurity? Find(string name) => All.FirstOrDefault(i => string.Equals(i.Name, name, StringComparison.OrdinalIgnoreCase));

    private static Impurity I(string name, string? smiles, params ImpurityGroup[] groups) => new(name, smiles, groups);

    private static ImpurityGroup G(string label, int? protons, string mult, int? j, string codes,
        double? hCdcl3, double? hDmso, double? cCdcl3, double? cDmso) =>
        new(label, protons, mult, j, false, Shifts(codes, hCdcl3, hDmso, cCdcl3, cDmso));

    private static ImpurityGroup X(string label, int protons, string mult, string codes, double? hCdcl3, double? hDmso) =>
        new(label, protons, mult, null, true, Shifts(codes, hCdcl3, hDmso, null, null));

    private static ImpurityShift[] Shifts(string codes, double? hC, double? hD, double? cC, double? cD)
    {
        var cells = new (string Solvent, Nucleus Nucleus, double? Ppm)[]
        {
            ("CDCl3", Nucleus.H1, hC), ("DMSO-d6", Nucleus.H1, hD), ("CDCl3", Nucleus.C13, cC), ("DMSO-d6", Nucleus.C13, cD),
        };
        return [.. cells.Select((cell, i) => (cell, code: codes[i]))
            .Where(x => x.cell.Ppm is not null)
            .Select(x => new ImpurityShift(x.cell.Solvent, x.cell.Nucleus, x.cell.Ppm!.Value, SourceOf(x.code)))];
    }

    private static DataSource SourceOf(char code) => code switch
    {
        'P' => new(SolventSources.Gottlieb1997, Provenance.Published),
        'T' => new(SolventSources.Fulmer2010, Provenance.Transcription),
        'M' => new(SolventSources.Gottlieb1997, Provenance.FromMemory),
        _ => throw new InvalidOperationException($"Impurity row has a value but no source code '{code}'."),
    };
}
