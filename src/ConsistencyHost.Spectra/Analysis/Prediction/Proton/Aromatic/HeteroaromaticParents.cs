namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>
/// Ring-proton shifts of parent heteroaromatics and fused benzenoids (CDCl3 unless noted), one row per parent: its
/// SMILES in ring-numbering order and the shift of each atom ("-" for atoms without a ring H). The lookup reads each
/// parent once, so a position is named by its surroundings (<see cref="RingPositionKey"/>) rather than by hand.
/// </summary>
/// <remarks>
/// P: Pretsch, Bühlmann &amp; Badertscher, Structure Determination of Organic Compounds, 4th ed., Springer 2009,
/// §5.6 (pp. 182–194), values as transcribed in a public code file citing those pages. Gottlieb 1997 gives pyridine
/// in CDCl3 as 8.62/7.29/7.68. M: from memory of the same book and of common spectra; these rows carry more width.
/// </remarks>
internal static class HeteroaromaticParents
{
    /// <summary>One parent: name, SMILES, per-atom shifts, half-width, source code.</summary>
    public static readonly (string Name, string Smiles, string Shifts, double HalfWidth, char Source)[] All =
    [
        ("pyridine", "n1ccccc1", "-, 8.59, 7.25, 7.62, 7.25, 8.59", 0.30, 'P'),
        ("pyrimidine", "n1cnccc1", "-, 9.27, -, 8.78, 7.38, 8.78", 0.30, 'P'),
        ("pyrazine", "n1ccncc1", "-, 8.63, 8.63, -, 8.63, 8.63", 0.30, 'P'),
        ("pyridazine", "n1ncccc1", "-, -, 9.21, 7.46, 7.46, 9.21", 0.30, 'P'),
        ("1,3,5-triazine", "n1cncnc1", "-, 9.25, -, 9.25, -, 9.25", 0.35, 'M'),
        ("furan", "o1cccc1", "-, 7.42, 6.38, 6.38, 7.42", 0.30, 'P'),
        ("thiophene", "s1cccc1", "-, 7.31, 7.09, 7.09, 7.31", 0.30, 'P'),
        ("pyrrole", "[nH]1cccc1", "-, 6.71, 6.23, 6.23, 6.71", 0.30, 'P'),
        ("oxazole", "o1cncc1", "-, 7.90, -, 7.15, 7.68", 0.35, 'P'),
        ("isoxazole", "o1nccc1", "-, -, 8.40, 6.38, 8.40", 0.35, 'P'),
        ("thiazole", "s1cncc1", "-, 8.88, -, 7.98, 7.41", 0.35, 'P'),
        ("isothiazole", "s1nccc1", "-, -, 8.54, 7.26, 8.72", 0.40, 'M'),
        ("imidazole", "[nH]1cncc1", "-, 7.70, -, 7.10, 7.10", 0.35, 'P'),
        ("pyrazole", "[nH]1nccc1", "-, -, 7.61, 6.28, 7.61", 0.35, 'M'),
        ("1-methyl-1,2,4-triazole", "Cn1ncnc1", "-, -, -, 7.94, -, 8.06", 0.45, 'M'),
        ("1-methyl-1,2,3-triazole", "Cn1nncc1", "-, -, -, -, 7.70, 7.85", 0.60, 'M'),
        ("2-methyl-2H-1,2,3-triazole", "Cn1nccn1", "-, -, -, 7.70, 7.70, -", 0.40, 'M'),
        ("1-methyltetrazole", "Cn1nnnc1", "-, -, -, -, -, 8.60", 0.60, 'M'),
        ("2-methyltetrazole", "Cn1ncnn1", "-, -, -, 8.50, -, -", 0.40, 'M'),
        ("1,3,4-oxadiazole", "o1cnnc1", "-, 8.45, -, -, 8.45", 0.50, 'M'),
        ("1,3,4-thiadiazole", "s1cnnc1", "-, 9.10, -, -, 9.10", 0.50, 'M'),
        ("1,2,4-oxadiazole", "o1ncnc1", "-, -, 8.20, -, 8.70", 0.45, 'M'),
        ("naphthalene", "c1cccc2ccccc12", "7.84, 7.48, 7.48, 7.84, -, 7.84, 7.48, 7.48, 7.84, -", 0.30, 'P'),
        ("quinoline", "n1cccc2ccccc12", "-, 8.92, 7.39, 8.12, -, 7.82, 7.55, 7.72, 8.15, -", 0.30, 'P'),
        ("isoquinoline", "c1nccc2ccccc12", "9.22, -, 8.50, 7.64, -, 7.82, 7.64, 7.55, 7.97, -", 0.30, 'P'),
        ("quinoxaline", "n1ccnc2ccccc12", "-, 8.81, 8.81, -, -, 8.10, 7.77, 7.77, 8.10, -", 0.30, 'M'),
        ("quinazoline", "n1cncc2ccccc12", "-, 9.38, -, 9.30, -, 7.93, 7.68, 7.95, 8.05, -", 0.35, 'M'),
        ("indole", "[nH]1ccc2ccccc12", "-, 7.12, 6.54, -, 7.64, 7.12, 7.18, 7.33, -", 0.35, 'P'),
        ("benzofuran", "o1ccc2ccccc12", "-, 7.54, 6.69, -, 7.55, 7.20, 7.25, 7.47, -", 0.30, 'P'),
        ("benzothiophene", "s1ccc2ccccc12", "-, 7.42, 7.33, -, 7.82, 7.36, 7.33, 7.88, -", 0.30, 'P'),
        ("benzoxazole", "o1cnc2ccccc12", "-, 8.10, -, -, 7.79, 7.41, 7.34, 7.58, -", 0.30, 'P'),
        ("benzothiazole", "s1cnc2ccccc12", "-, 8.97, -, -, 7.94, 7.46, 7.51, 8.14, -", 0.30, 'P'),
        ("benzimidazole", "[nH]1cnc2ccccc12", "-, 8.08, -, -, 7.70, 7.26, 7.26, 7.70, -", 0.35, 'P'),
        ("indazole", "[nH]1ncc2ccccc12", "-, -, 8.08, -, 7.76, 7.16, 7.38, 7.50, -", 0.40, 'M'),
        ("carbazole", "c1cccc2c3ccccc3[nH]c12", "7.41, 7.40, 7.23, 8.09, -, -, 8.09, 7.23, 7.40, 7.41, -, -, -", 0.30, 'M'),
        ("imidazo[1,2-a]pyridine", "n1ccn2ccccc12", "-, 7.58, 7.62, -, 8.10, 6.77, 7.15, 7.62, -", 0.40, 'M'),
        ("2-pyridone", "O=C1C=CC=CN1", "-, -, 6.57, 7.40, 6.22, 7.32, -", 0.45, 'M'),
        ("uracil (DMSO-d6)", "O=C1C=CNC(=O)N1", "-, -, 5.45, 7.38, -, -, -, -", 0.45, 'M'),
        ("coumarin", "O=C1C=Cc2ccccc2O1", "-, -, 6.43, 7.72, -, 7.48, 7.28, 7.52, 7.33, -, -", 0.40, 'M'),
        ("chromone", "O=C1C=COC2=CC=CC=C12", "-, -, 6.33, 7.87, -, -, 7.46, 7.68, 7.40, 8.21, -", 0.40, 'M'),
    ];
}
