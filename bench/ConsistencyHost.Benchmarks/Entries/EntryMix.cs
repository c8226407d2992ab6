using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Sdk.Entries;

namespace ConsistencyHost.Benchmarks.Entries;

/// <summary>
/// A realistic mix of notebook entries: real compounds of 25–30 heavy atoms, 12–22 1H signals, a 13C list and
/// an HRMS line each, written as a chemist pastes them. Shifts and couplings are typical literature values
/// written from memory (they are a workload, not reference data); calculated m/z values were computed from
/// the formulas with RDKit (ExactMolWt, electron mass subtracted).
/// </summary>
public static class EntryMix
{
    /// <summary>Entries in the mix (the per-entry benchmarks divide by it).</summary>
    public const int Count = 4;

    /// <summary>The submissions, as the engine receives them.</summary>
    public static IReadOnlyList<EntrySubmission> All { get; } =
    [
        // From memory of published strychnine assignments (CDCl3); six stereocentres, 22 signals.
        Entry("strychnine",
            "O=C7N2c1ccccc1[C@@]64[C@@H]2[C@@H]3[C@@H](OC/C=C5\\[C@@H]3C[C@@H]6N(CC4)C5)C7",
            "C21H22N2O2",
            "1H NMR (500 MHz, CDCl3) δ 8.09 (d, J = 7.9 Hz, 1H), 7.24 (td, J = 7.7, 1.2 Hz, 1H), 7.16 (d, J = 7.4 Hz, 1H), 7.09 (td, J = 7.5, 1.0 Hz, 1H), 5.89 (m, 1H), 4.28 (dt, J = 8.4, 3.3 Hz, 1H), 4.14 (dd, J = 13.8, 7.0 Hz, 1H), 4.05 (dd, J = 13.8, 5.8 Hz, 1H), 3.93 (m, 1H), 3.86 (d, J = 10.5 Hz, 1H), 3.71 (d, J = 14.8 Hz, 1H), 3.20 (m, 1H), 3.15 (m, 1H), 3.12 (dd, J = 17.4, 8.5 Hz, 1H), 2.86 (m, 1H), 2.73 (d, J = 14.8 Hz, 1H), 2.67 (dd, J = 17.4, 3.3 Hz, 1H), 2.36 (dt, J = 14.3, 4.3 Hz, 1H), 1.87 (m, 2H), 1.43 (dt, J = 14.3, 2.2 Hz, 1H), 1.27 (dt, J = 10.4, 3.3 Hz, 1H). "
            + "13C NMR (126 MHz, CDCl3) δ 169.3, 142.2, 140.5, 132.7, 128.5, 127.2, 124.2, 122.3, 116.2, 77.6, 64.6, 60.1, 60.0, 52.7, 51.9, 50.3, 48.2, 42.5, 42.4, 31.6, 26.9. "
            + "HRMS (ESI) m/z: [M + H]+ calcd for C21H23N2O2 335.1754; found 335.1751."),
        // From memory of typical Boc-dipeptide ester data (CDCl3); two stereocentres, diastereotopic CH2 and methyls.
        Entry("boc-phe-leu-ome",
            "COC(=O)[C@H](CC(C)C)NC(=O)[C@H](Cc1ccccc1)NC(=O)OC(C)(C)C",
            "C21H32N2O5",
            "1H NMR (400 MHz, CDCl3) δ 7.29 (t, J = 7.3 Hz, 2H), 7.23 (t, J = 7.2 Hz, 1H), 7.19 (d, J = 7.1 Hz, 2H), 6.28 (d, J = 8.1 Hz, 1H), 4.98 (br s, 1H), 4.57 (td, J = 8.5, 5.0 Hz, 1H), 4.34 (q, J = 7.0 Hz, 1H), 3.70 (s, 3H), 3.08 (dd, J = 13.8, 6.3 Hz, 1H), 3.03 (dd, J = 13.8, 7.3 Hz, 1H), 1.62–1.52 (m, 2H), 1.50–1.42 (m, 1H), 1.40 (s, 9H), 0.90 (d, J = 6.2 Hz, 3H), 0.88 (d, J = 6.3 Hz, 3H). "
            + "13C NMR (101 MHz, CDCl3) δ 172.9, 171.1, 155.4, 136.7, 129.4, 128.6, 126.9, 80.1, 55.7, 52.3, 50.8, 41.6, 38.4, 28.3, 24.7, 22.8, 21.9. "
            + "HRMS (ESI) m/z: [M + Na]+ calcd for C21H32N2NaO5 415.2203; found 415.2198."),
        // From memory of ezetimibe data (DMSO-d6); C–F couplings in the 13C list, exchangeable OH signals.
        Entry("ezetimibe",
            "O[C@@H](CC[C@@H]1[C@H](N(C1=O)c1ccc(F)cc1)c1ccc(O)cc1)c1ccc(F)cc1",
            "C24H21F2NO3",
            "1H NMR (400 MHz, DMSO-d6) δ 9.51 (s, 1H), 7.31 (dd, J = 8.5, 5.6 Hz, 2H), 7.24 (dd, J = 9.0, 4.8 Hz, 2H), 7.20 (d, J = 8.5 Hz, 2H), 7.14–7.07 (m, 4H), 6.76 (d, J = 8.5 Hz, 2H), 5.27 (d, J = 4.5 Hz, 1H), 4.80 (d, J = 2.2 Hz, 1H), 4.49 (m, 1H), 3.08 (m, 1H), 1.85–1.74 (m, 2H), 1.74–1.62 (m, 2H). "
            + "13C NMR (101 MHz, DMSO-d6) δ 167.3, 161.3 (d, J = 242.5 Hz), 158.2 (d, J = 241.5 Hz), 157.2, 142.6 (d, J = 2.7 Hz), 134.1 (d, J = 2.3 Hz), 128.0 (d, J = 8.0 Hz), 127.6, 127.3, 118.3 (d, J = 7.9 Hz), 115.9 (d, J = 22.6 Hz), 115.7, 114.7 (d, J = 21.0 Hz), 70.9, 59.8, 59.6, 36.4, 24.8. "
            + "HRMS (ESI) m/z: [M + Na]+ calcd for C24H21F2NNaO3 432.1382; found 432.1379."),
        // From memory of typical Fmoc-amino-acid data (CDCl3); fluorenyl CH2 diastereotopic next to nothing chiral.
        Entry("fmoc-val-oh",
            "CC(C)[C@H](NC(=O)OCC1c2ccccc2-c2ccccc12)C(=O)O",
            "C20H21NO4",
            "1H NMR (400 MHz, CDCl3) δ 10.20 (br s, 1H), 7.76 (d, J = 7.5 Hz, 2H), 7.60 (t, J = 6.8 Hz, 2H), 7.40 (t, J = 7.4 Hz, 2H), 7.31 (td, J = 7.4, 1.1 Hz, 2H), 5.27 (d, J = 9.0 Hz, 1H), 4.45 (dd, J = 10.5, 7.0 Hz, 1H), 4.40 (dd, J = 10.5, 7.1 Hz, 1H), 4.38 (dd, J = 9.0, 4.6 Hz, 1H), 4.23 (t, J = 6.9 Hz, 1H), 2.25 (m, 1H), 1.01 (d, J = 6.9 Hz, 3H), 0.94 (d, J = 6.9 Hz, 3H). "
            + "13C NMR (101 MHz, CDCl3) δ 176.6, 156.3, 143.9, 143.7, 141.3, 127.7, 127.1, 125.1, 120.0, 67.2, 58.8, 47.2, 31.1, 19.0, 17.5. "
            + "HRMS (ESI) m/z: [M + Na]+ calcd for C20H21NNaO4 362.1363; found 362.1360."),
    ];

    private static EntrySubmission Entry(string id, string smiles, string formula, string text) => new()
    {
        EntryId = id,
        Structure = new StructureSource(StructureFormat.Smiles, smiles),
        Formula = formula,
        ReportedText = [text],
    };
}
