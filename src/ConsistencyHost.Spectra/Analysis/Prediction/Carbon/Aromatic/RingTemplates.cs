namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Parent aromatic ring systems and their 13C shifts (ppm, CDCl3 unless noted), matched against each aromatic ring
/// system of a molecule; substituents then add benzene increments (<see cref="BenzeneIncrements"/>).
/// </summary>
/// <remarks>
/// Benzene 128.5 is the base of the benzene increment table (Pretsch et al. 2009; Gottlieb 1997 prints 128.37).
/// Pyridine 149.9/123.8/136.0: Gottlieb 1997 and Fulmer 2010 (149.90/123.75/135.96). All other values are from
/// memory of the heteroaromatic tables of Pretsch, Bühlmann and Badertscher, Structure Determination of Organic
/// Compounds, 4th ed. (2009) and Kalinowski, Berger and Braun, Carbon-13 NMR Spectroscopy (1988); pyridones,
/// uracil, 4-quinolone and quinazolinone in DMSO-d6. Fixed-tautomer values are those of the N-methyl compounds;
/// <c>averaged</c> gives the values under fast N–H exchange (imidazole C-4/5 122, benzimidazole C-4/7 115.5).
/// The spread (third argument) is 0.5–1.0 for values remembered with confidence and 2–3 for the rest.
/// </remarks>
internal static class RingTemplates
{
    /// <summary>Every template as written.</summary>
    public static readonly RingTemplate[] Defined = Build();

    /// <summary>The templates that can match (perceived as one aromatic system); a test holds this equal to <see cref="Defined"/>.</summary>
    public static readonly RingTemplate[] All = Array.FindAll(Defined, t => t.IsUsable);

    private static readonly Dictionary<(int, ulong), RingTemplate[]> BySignature = All
        .GroupBy(t => (t.Atoms.Length, t.Signature))
        .ToDictionary(g => g.Key, g => g.ToArray());

    /// <summary>The templates with <paramref name="size"/> ring-system atoms and these kind counts (often none).</summary>
    public static RingTemplate[] Candidates(int size, ulong signature) =>
        BySignature.TryGetValue((size, signature), out var found) ? found : [];

    private static RingTemplate[] Build()
    {
        RingTemplate[] all =
        [
            new("benzene", RingKind.Benzenoid, 0, "[cH:1]1[cH:1][cH:1][cH:1][cH:1][cH:1]1", [(1, 128.5)]),
            new("pyridine", RingKind.Azine, 0.5, "[n:1]1[cH:2][cH:3][cH:4][cH:3][cH:2]1", [(2, 149.9), (3, 123.8), (4, 136.0)]),
            new("pyrimidine", RingKind.Azine, 1.0, "[n:1]1[cH:2][n:1][cH:4][cH:5][cH:4]1", [(2, 158.7), (4, 157.0), (5, 121.7)]),
            new("pyrazine", RingKind.Azine, 0.5, "[n:1]1[cH:2][cH:2][n:1][cH:2][cH:2]1", [(2, 145.1)]),
            new("pyridazine", RingKind.Azine, 1.0, "[n:1]1[n:1][cH:3][cH:4][cH:4][cH:3]1", [(3, 151.6), (4, 126.6)]),
            new("1,3,5-triazine", RingKind.Azine, 1.5, "[n:1]1[cH:2][n:1][cH:2][n:1][cH:2]1", [(2, 166.1)]),
            new("pyrrole", RingKind.FiveMembered, 0.5, "[nH:1]1[cH:2][cH:3][cH:3][cH:2]1", [(2, 117.9), (3, 108.2)]),
            new("furan", RingKind.FiveMembered, 0.5, "[o:1]1[cH:2][cH:3][cH:3][cH:2]1", [(2, 142.8), (3, 109.6)]),
            new("thiophene", RingKind.FiveMembered, 0.5, "[s:1]1[cH:2][cH:3][cH:3][cH:2]1", [(2, 125.5), (3, 127.3)]),
            new("imidazole", RingKind.FiveMembered, 1.5, "[nH:1]1[cH:2][n:3][cH:4][cH:5]1", [(2, 136.5), (4, 128.8), (5, 120.3)],
                [(2, 135.5), (4, 122.0), (5, 122.0)]),
            new("pyrazole", RingKind.FiveMembered, 1.5, "[nH:1]1[n:2][cH:3][cH:4][cH:5]1", [(3, 138.8), (4, 105.6), (5, 129.5)],
                [(3, 133.8), (4, 105.0), (5, 133.8)]),
            new("oxazole", RingKind.FiveMembered, 1.0, "[o:1]1[cH:2][n:3][cH:4][cH:5]1", [(2, 150.6), (4, 125.4), (5, 138.1)]),
            new("thiazole", RingKind.FiveMembered, 1.0, "[s:1]1[cH:2][n:3][cH:4][cH:5]1", [(2, 153.4), (4, 143.7), (5, 119.7)]),
            new("isoxazole", RingKind.FiveMembered, 1.0, "[o:1]1[n:2][cH:3][cH:4][cH:5]1", [(3, 149.1), (4, 103.7), (5, 157.9)]),
            new("isothiazole", RingKind.FiveMembered, 1.5, "[s:1]1[n:2][cH:3][cH:4][cH:5]1", [(3, 157.0), (4, 123.4), (5, 147.8)]),
            new("1,2,4-triazole", RingKind.FiveMembered, 2.5, "[nH:1]1[n:2][cH:3][n:4][cH:5]1", [(3, 152.0), (5, 144.0)],
                [(3, 147.5), (5, 147.5)]),
            new("4H-1,2,4-triazole", RingKind.FiveMembered, 2.5, "[n:1]1[n:1][cH:3][nH:4][cH:3]1", [(3, 143.5)]),
            new("1,2,3-triazole", RingKind.FiveMembered, 2.0, "[nH:1]1[n:2][n:3][cH:4][cH:5]1", [(4, 134.0), (5, 123.5)],
                [(4, 130.5), (5, 130.5)]),
            new("2H-1,2,3-triazole", RingKind.FiveMembered, 2.5, "[n:1]1[nH:2][n:1][cH:4][cH:4]1", [(4, 134.5)]),
            new("1H-tetrazole", RingKind.FiveMembered, 3.0, "[nH:1]1[n:2][n:3][n:4][cH:5]1", [(5, 143.0)], [(5, 147.0)]),
            new("2H-tetrazole", RingKind.FiveMembered, 3.0, "[n:1]1[nH:2][n:3][n:4][cH:5]1", [(5, 153.0)]),
            new("1,3,4-oxadiazole", RingKind.FiveMembered, 2.5, "[o:1]1[cH:2][n:3][n:3][cH:2]1", [(2, 152.7)]),
            new("1,2,4-oxadiazole", RingKind.FiveMembered, 3.0, "[o:1]1[n:2][cH:3][n:4][cH:5]1", [(3, 157.5), (5, 165.0)]),
            new("1,3,4-thiadiazole", RingKind.FiveMembered, 3.0, "[s:1]1[cH:2][n:3][n:3][cH:2]1", [(2, 152.8)]),
            new("2-pyridone", RingKind.Oxo, 1.5, "O=[c:2]1[cH:3][cH:4][cH:5][cH:6][nH:1]1",
                [(2, 164.0), (3, 120.2), (4, 140.8), (5, 105.8), (6, 135.0)]),
            new("4-pyridone", RingKind.Oxo, 3.0, "O=[c:4]1[cH:3][cH:2][nH:1][cH:2][cH:3]1", [(4, 176.0), (3, 116.5), (2, 140.0)]),
            new("uracil", RingKind.Oxo, 1.5, "O=[c:4]1[cH:5][cH:6][nH:1][c:2](=O)[nH:3]1", [(4, 164.4), (5, 100.5), (6, 142.3), (2, 151.6)]),
            .. Fused(),
        ];
        return all;
    }

    private static RingTemplate[] Fused() =>
    [
        new("naphthalene", RingKind.Benzenoid, 1.5, "[cH:1]1[cH:2][cH:2][cH:1][c:40]2[cH:1][cH:2][cH:2][cH:1][c:40]12",
            [(1, 128.0), (2, 125.9), (40, 133.6)]),
        new("anthracene", RingKind.Benzenoid, 1.0, "[cH:1]1[cH:2][cH:2][cH:1][c:40]2[cH:9][c:40]3[cH:1][cH:2][cH:2][cH:1][c:40]3[cH:9][c:40]12",
            [(1, 128.1), (2, 125.3), (9, 126.2), (40, 131.7)]),
        new("phenanthrene", RingKind.Benzenoid, 1.0, "[cH:1]1[cH:2][cH:3][cH:4][c:40]2[c:40]3[cH:4][cH:3][cH:2][cH:1][c:100]3[cH:9][cH:9][c:100]12",
            [(1, 128.5), (2, 126.5), (3, 126.5), (4, 122.6), (40, 130.3), (100, 132.0), (9, 126.9)]),
        new("quinoline", RingKind.Azine, 1.5, "[n:1]1[cH:2][cH:3][cH:4][c:40]2[cH:5][cH:6][cH:7][cH:8][c:80]12",
            [(2, 150.3), (3, 121.1), (4, 136.0), (40, 128.3), (5, 127.8), (6, 126.5), (7, 129.4), (8, 129.4), (80, 148.3)]),
        new("isoquinoline", RingKind.Azine, 1.5, "[cH:1]1[n:2][cH:3][cH:4][c:40]2[cH:5][cH:6][cH:7][cH:8][c:80]12",
            [(1, 152.6), (3, 143.1), (4, 120.4), (40, 135.7), (5, 126.4), (6, 130.3), (7, 127.2), (8, 127.6), (80, 128.7)]),
        new("quinoxaline", RingKind.Azine, 1.0, "[n:1]1[cH:2][cH:2][n:1][c:40]2[cH:5][cH:6][cH:6][cH:5][c:40]12",
            [(2, 145.1), (40, 143.0), (5, 129.5), (6, 129.9)]),
        new("quinazoline", RingKind.Azine, 2.0, "[cH:2]1[n:3][cH:4][c:40]2[cH:5][cH:6][cH:7][cH:8][c:80]2[n:1]1",
            [(2, 160.5), (4, 155.5), (40, 125.2), (5, 127.2), (6, 127.9), (7, 134.1), (8, 128.5), (80, 150.1)]),
        new("indole", RingKind.FiveMembered, 1.0, "[nH:1]1[cH:2][cH:3][c:30]2[cH:4][cH:5][cH:6][cH:7][c:70]12",
            [(2, 124.2), (3, 102.6), (30, 127.9), (4, 120.8), (5, 119.9), (6, 122.0), (7, 111.1), (70, 135.8)]),
        new("benzofuran", RingKind.FiveMembered, 1.0, "[o:1]1[cH:2][cH:3][c:30]2[cH:4][cH:5][cH:6][cH:7][c:70]12",
            [(2, 144.9), (3, 106.6), (30, 127.5), (4, 121.2), (5, 122.8), (6, 124.3), (7, 111.5), (70, 155.0)]),
        new("benzothiophene", RingKind.FiveMembered, 1.0, "[s:1]1[cH:2][cH:3][c:30]2[cH:4][cH:5][cH:6][cH:7][c:70]12",
            [(2, 126.2), (3, 123.8), (30, 139.7), (4, 123.6), (5, 124.2), (6, 124.3), (7, 122.4), (70, 139.8)]),
        new("benzimidazole", RingKind.FiveMembered, 2.0, "[nH:1]1[cH:2][n:3][c:30]2[cH:4][cH:5][cH:6][cH:7][c:70]12",
            [(2, 143.7), (30, 143.5), (4, 120.3), (5, 122.1), (6, 122.9), (7, 109.4), (70, 134.6)],
            [(2, 141.9), (30, 138.0), (4, 115.5), (5, 121.7), (6, 121.7), (7, 115.5), (70, 138.0)]),
        new("benzoxazole", RingKind.FiveMembered, 1.5, "[o:1]1[cH:2][n:3][c:30]2[cH:4][cH:5][cH:6][cH:7][c:70]12",
            [(2, 152.6), (30, 140.1), (4, 120.5), (5, 124.5), (6, 125.5), (7, 110.8), (70, 150.0)]),
        new("benzothiazole", RingKind.FiveMembered, 1.5, "[s:1]1[cH:2][n:3][c:30]2[cH:4][cH:5][cH:6][cH:7][c:70]12",
            [(2, 153.9), (30, 153.3), (4, 123.6), (5, 126.2), (6, 125.5), (7, 121.9), (70, 133.7)]),
        new("1H-indazole", RingKind.FiveMembered, 1.5, "[nH:1]1[n:2][cH:3][c:30]2[cH:4][cH:5][cH:6][cH:7][c:70]12",
            [(3, 134.8), (30, 123.1), (4, 120.9), (5, 120.8), (6, 126.8), (7, 109.7), (70, 140.0)]),
        new("2H-indazole", RingKind.FiveMembered, 2.5, "[n:1]1[nH:2][cH:3][c:30]2[cH:4][cH:5][cH:6][cH:7][c:70]12",
            [(3, 123.5), (30, 121.8), (4, 120.2), (5, 121.6), (6, 125.8), (7, 117.3), (70, 149.0)]),
        new("imidazo[1,2-a]pyridine", RingKind.FiveMembered, 2.0, "[n:1]1[cH:2][cH:3][n:4]2[cH:5][cH:6][cH:7][cH:8][c:80]12",
            [(2, 133.7), (3, 112.4), (5, 125.6), (6, 112.1), (7, 124.4), (8, 117.4), (80, 145.4)]),
        new("7-azaindole", RingKind.FiveMembered, 2.0, "[nH:1]1[cH:2][cH:3][c:30]2[cH:4][cH:5][cH:6][n:7][c:70]12",
            [(2, 126.0), (3, 100.0), (30, 120.3), (4, 128.7), (5, 115.6), (6, 142.6), (70, 148.8)]),
        new("carbazole", RingKind.FiveMembered, 1.0, "[nH:9]1[c:90]2[cH:1][cH:2][cH:3][cH:4][c:40]2[c:40]2[cH:4][cH:3][cH:2][cH:1][c:90]12",
            [(1, 110.6), (2, 125.8), (3, 119.4), (4, 120.3), (40, 123.4), (90, 139.5)]),
        new("dibenzofuran", RingKind.FiveMembered, 1.0, "[o:5]1[c:40]2[cH:4][cH:3][cH:2][cH:1][c:90]2[c:90]2[cH:1][cH:2][cH:3][cH:4][c:40]12",
            [(40, 156.2), (4, 111.7), (3, 127.1), (2, 122.7), (1, 120.7), (90, 124.3)]),
        new("coumarin", RingKind.Oxo, 1.0, "O=[c:2]1[cH:3][cH:4][c:40]2[cH:5][cH:6][cH:7][cH:8][c:80]2[o:1]1",
            [(2, 160.7), (3, 116.7), (4, 143.4), (40, 118.8), (5, 127.9), (6, 124.4), (7, 131.8), (8, 116.8), (80, 154.0)]),
        new("quinolin-2-one", RingKind.Oxo, 1.5, "O=[c:2]1[cH:3][cH:4][c:40]2[cH:5][cH:6][cH:7][cH:8][c:80]2[nH:1]1",
            [(2, 162.5), (3, 121.6), (4, 140.5), (40, 119.2), (5, 127.9), (6, 122.0), (7, 130.6), (8, 115.6), (80, 139.0)]),
        new("4-quinolone", RingKind.Oxo, 2.0, "O=[c:4]1[cH:3][cH:2][nH:1][c:80]2[cH:8][cH:7][cH:6][cH:5][c:40]12",
            [(4, 177.0), (3, 108.7), (2, 139.5), (80, 140.3), (8, 118.3), (7, 131.5), (6, 123.1), (5, 124.9), (40, 125.8)]),
        new("chromone", RingKind.Oxo, 1.5, "O=[c:4]1[cH:3][cH:2][o:1][c:80]2[cH:8][cH:7][cH:6][cH:5][c:40]12",
            [(4, 177.4), (3, 112.9), (2, 155.3), (80, 156.4), (8, 118.1), (7, 133.6), (6, 125.2), (5, 125.7), (40, 124.9)]),
        new("quinazolin-4-one", RingKind.Oxo, 2.5, "O=[c:4]1[nH:3][cH:2][n:1][c:80]2[cH:8][cH:7][cH:6][cH:5][c:40]12",
            [(4, 161.0), (2, 145.6), (80, 149.0), (8, 127.3), (7, 134.4), (6, 126.9), (5, 126.0), (40, 122.8)]),
    ];
}
