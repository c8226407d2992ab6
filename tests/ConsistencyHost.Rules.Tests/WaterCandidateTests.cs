using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.Tests;

/// <summary>
/// A signal the author integrated to 3 H or more is the compound's, never water (common practice: water is one
/// unintegrated or ~2 H exchange-averaged line). Reading a 9 H singlet in the wide CDCl3 water window (1.56 ppm,
/// Gottlieb 1997) as water would hide a wrong structure behind a water warning.
/// </summary>
public sealed class WaterCandidateTests
{
    [Fact]
    public void Check_BocSingletOnAStructureDrawnWithoutTheBoc_IsATotalMismatchNotWater()
    {
        // Benzylamine drawn for the data of its N-Boc carbamate (typical shifts in CDCl3, from memory; invented
        // entry of the lab scenario): the 9 H singlet at 1.46 ppm sits in the water window, but it is the Boc group
        // the structure lacks, so the integrals must disagree with the structure.
        var report = BuiltInRules.Check("NCc1ccccc1",
            "1H NMR (400 MHz, CDCl3) δ 7.35–7.24 (m, 5H), 4.85 (br s, 1H), 4.31 (d, J = 5.8 Hz, 2H), 1.46 (s, 9H).").AllRulesRan();

        Assert.DoesNotContain("water-reported", report.Codes("solvent-residual"));
        Assert.Contains("total-protons-mismatch", report.Codes("integral-ratio"));
    }

    // Benzylamine drawn for the data of N-benzylacetamide (typical CDCl3 shifts, from memory; invented entry of the lab
    // scenario), given as a peak list with raw integrals and no proton counts, as from an exported peak table, the NH not
    // listed. The acetyl singlet at 2.02 ppm sits in the CDCl3 water window (1.56, Gottlieb 1997 Table 1) and the integral
    // scale counts it 3 H: it is the compound's, so the structure must draw a mismatch, not a water warning. Before,
    // only stated counts kept a signal out of the water candidates, and this one was read as water.
    private static EntrySubmission AcetamideDataAsRawIntegrals() => new()
    {
        EntryId = "AIS-LQ-TEST",
        Structure = new StructureSource(StructureFormat.Smiles, "NCc1ccccc1"),
        Spectra =
        [
            new SpectrumSubmission
            {
                Nucleus = "1H", FrequencyMHz = 400, Solvent = "CDCl3",
                Signals =
                [
                    new Signal { RangeLowPpm = 7.25, RangeHighPpm = 7.36, Multiplicity = "m", Integral = 5.02 },
                    new Signal { ShiftPpm = 4.42, Multiplicity = "d", Couplings = [new Coupling(5.7)], Integral = 2.05 },
                    new Signal { ShiftPpm = 2.02, Multiplicity = "s", Integral = 3.04 },
                ],
            },
        ],
    };

    [Fact]
    public void Interpret_MethylSingletGivenAsRawIntegral_IsNotWater()
    {
        var reading = new EntryIntake(IntakeLimits.Default).Build(AcetamideDataAsRawIntegrals()).Analysis.Protons(0)!;

        Assert.Null(reading.StatedCounts[2]);
        Assert.Equal(3, reading.ProtonCounts[2]);
        Assert.NotEqual(SignalRole.Water, reading.Roles[2]);
    }

    [Fact]
    public void Check_MethylSingletGivenAsRawIntegral_DrawsNoWaterWarning()
    {
        var report = BuiltInRules.Engine.Check(AcetamideDataAsRawIntegrals()).AllRulesRan();

        Assert.DoesNotContain("water-reported", report.Codes("solvent-residual"));
    }

    [Fact]
    public void Check_UnintegratedLineAtTheWaterShift_IsStillWater()
    {
        // Methyl 4-methylbenzoate (methyl p-toluate) with a stray 1.56 ppm line in CDCl3: water at 1.56 ppm in
        // CDCl3 (Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512); compound shifts typical, from memory.
        var report = BuiltInRules.Check("COC(=O)c1ccc(C)cc1",
            "1H NMR (400 MHz, CDCl3) δ 7.93 (d, J = 8.2 Hz, 2H), 7.23 (d, J = 8.2 Hz, 2H), 3.90 (s, 3H), 2.40 (s, 3H), 1.56 (s, 2H).").AllRulesRan();

        Assert.Contains("water-reported", report.Codes("solvent-residual"));
    }

    [Fact]
    public void Interpret_PublishedSiEntries_NeverReadAThreeProtonSignalAsWater()
    {
        var checkedEntries = 0;
        var wrong = new List<string>();
        foreach (var (id, _, smiles, text) in PublishedSiEntries.All)
        {
            Entry entry;
            try
            {
                entry = new EntryIntake(IntakeLimits.Default).Build(new EntrySubmission
                {
                    EntryId = id,
                    Structure = new StructureSource(StructureFormat.Smiles, smiles),
                    ReportedText = [text],
                });
            }
            catch (EntryInputException)
            {
                continue; // Text the intake cannot read yet; counted below so the test cannot pass on nothing.
            }

            for (var i = 0; i < entry.Spectra.Count; i++)
            {
                if (entry.Spectra[i].Nucleus != Nucleus.H1 || entry.Analysis.Protons(i) is not { } reading) continue;
                checkedEntries++;
                for (var s = 0; s < reading.Roles.Count; s++)
                {
                    if (reading.Roles[s] == SignalRole.Water && reading.StatedCounts[s] >= 3)
                    {
                        wrong.Add($"{id}: signal {s} ({reading.StatedCounts[s]} H) read as water");
                    }
                }
            }
        }

        Assert.True(checkedEntries >= 40, $"only {checkedEntries} published 1H lists were readable");
        Assert.True(wrong.Count == 0, string.Join("\n", wrong));
    }
}
