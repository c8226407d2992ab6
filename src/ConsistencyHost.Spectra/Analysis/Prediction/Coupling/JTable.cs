namespace ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

/// <summary>
/// Sizes of the coupling types, each with its source. The ranges are the usual spread for organic compounds
/// in solution, not extremes of unusual systems; a check using them adds its own tolerance.
/// </summary>
public static class JTable
{
    private const string Pretsch = "Pretsch, Structure Determination of Organic Compounds, H,H and H,X coupling tables (from memory)";
    private const string Friebolin = "Friebolin, Basic One- and Two-Dimensional NMR Spectroscopy, ch. 3 (from memory)";
    private const string Silverstein = "Silverstein, Spectrometric Identification of Organic Compounds, coupling tables (from memory)";
    private const string Practice = "common practice";

    private static readonly Dictionary<CouplingType, JRange> Ranges = new()
    {
        [CouplingType.GeminalSp3] = new(10, 18, false, Pretsch),
        [CouplingType.GeminalVinyl] = new(0, 3, true, Pretsch),
        [CouplingType.VicinalFreelyRotating] = new(6, 8, false, Friebolin),
        [CouplingType.VicinalRing] = new(0, 13, true, Friebolin + "; Karplus dependence, axial–axial up to 13"),
        [CouplingType.VicinalRingAveraged] = new(2.5, 9, false, Friebolin + "; fast ring inversion averages cyclohexane-type Jaa 10–13, Jae/Jee 2–5 to about 3–4 and 6–8 Hz, neither of which vanishes"),
        [CouplingType.VicinalAldehyde] = new(0, 3.5, true, Silverstein),
        [CouplingType.VicinalExchangeable] = new(3, 9, true, Practice + ": O–H/N–H coupling seen in dry DMSO-d6, lost by exchange in CDCl3 or CD3OD"),
        [CouplingType.VinylCis] = new(5, 13, false, Pretsch + "; cis 6–12 typical"),
        [CouplingType.VinylTrans] = new(11, 19, false, Pretsch + "; trans 12–18 typical"),
        [CouplingType.VinylCisOrTrans] = new(5, 19, false, Pretsch),
        [CouplingType.VinylCisInSmallRing] = new(0, 11, true, Friebolin + "; cyclopropene 0–2, cyclobutene ~3, cyclopentene 5–7, cyclohexene 9–11"),
        [CouplingType.AromaticOrtho] = new(6, 10, false, Pretsch + "; benzene ortho 7–9"),
        [CouplingType.AromaticOrthoNextToNitrogen] = new(4, 6.5, false, Pretsch + "; pyridine J2,3 4–6"),
        [CouplingType.AromaticFiveRing] = new(1.5, 6, true, Pretsch + "; furan J2,3 ~1.8, thiophene J2,3 ~5, pyrrole ~2.6"),
        [CouplingType.AromaticMeta] = new(0.5, 3.5, true, Pretsch + "; benzene meta 1–3"),
        [CouplingType.LongRange] = new(0, 3, true, Pretsch + "; allylic 4J 0–3"),
        [CouplingType.HF2J] = new(42, 80, false, Pretsch + "; H–C–F 45–80"),
        [CouplingType.HF3J] = new(0, 30, true, Pretsch + "; H–C–C–F 0–30 (aromatic ortho F 6–11)"),
        [CouplingType.HF3JAromaticOrtho] = new(6, 11, false, Pretsch + "; aromatic ortho H–F 6–11 (fluorobenzene 3J 9.1)"),
        [CouplingType.HF4J] = new(0, 9, true, Pretsch + "; aromatic meta F 4–8, para 0–3"),
        [CouplingType.HP1J] = new(180, 750, false, Pretsch),
        [CouplingType.HP2J] = new(0, 30, true, Pretsch),
        [CouplingType.HP3J] = new(0, 30, true, Pretsch + "; P–O–CH 5–10, P–C–CH 15–20"),
        [CouplingType.HP4J] = new(0, 3, true, Pretsch),
        [CouplingType.CF1J] = new(150, 300, false, Pretsch + "; CH2F ~165, ArF ~245, CF3 ~270–290"),
        [CouplingType.CF2J] = new(15, 45, false, Pretsch + "; ArC ortho to F ~21, CF3–C ~32"),
        [CouplingType.CF3J] = new(0, 12, true, Pretsch + "; ArC meta to F ~8, CF3–C–C ~4"),
        [CouplingType.CF4J] = new(0, 5, true, Pretsch + "; ArC para to F ~3, often unresolved"),
    };

    /// <summary>The expected |J| of <paramref name="type"/>.</summary>
    public static JRange Of(CouplingType type) => Ranges[type];
}
