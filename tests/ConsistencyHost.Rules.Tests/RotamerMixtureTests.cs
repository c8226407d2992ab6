using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Rules.Tests;

/// <summary>
/// Rotamer mixtures reported with fractional integrals per rotamer (common practice for Boc carbamates and
/// N,N-disubstituted amides, whose C–N rotation is slow on the NMR time scale). No published entry with
/// fractional per-rotamer integrals is in Fixtures/ (the SI entries there write "4.48/4.29 (s, 2 H)"), so the
/// entries below are from the invented lab scenario; shifts are typical values, from memory.
/// </summary>
public sealed class RotamerMixtureTests
{
    // tert-Butyl benzyl(methyl)carbamate, C13H19NO2 (19 H), as a 6:4 rotamer mixture: each rotamer-split
    // environment is given as a major and a minor signal whose integrals add up to the environment's protons.
    private const string BocCarbamate = "CN(Cc1ccccc1)C(=O)OC(C)(C)C";

    private const string BocText =
        "1H NMR (400 MHz, CDCl3) δ 7.36–7.20 (m, 5H), 4.43 (br s, 1.2H, major rotamer), 4.40 (br s, 0.8H, minor rotamer), " +
        "2.84 (br s, 1.8H, major rotamer), 2.80 (br s, 1.2H, minor rotamer), 1.49 (s, 5.4H, major rotamer), 1.46 (s, 3.6H, minor rotamer).";

    [Fact]
    public void Check_BocRotamerMixtureWithWholeMoleculeTotals_NoIntegralOrWaterFinding()
    {
        var report = BuiltInRules.Check(BocCarbamate, BocText).AllRulesRan();

        Assert.DoesNotContain(report.Codes("integral-ratio"), c => c != "fractional-count");
        Assert.DoesNotContain("water-reported", report.Codes("solvent-residual"));
        Assert.DoesNotContain(report.Findings, f => f.Finding.Severity >= Severity.Warning);
    }

    [Fact]
    public void Check_BocRotamerMixture_FractionsAreSummedNotRoundedAway()
    {
        var report = BuiltInRules.Check(BocCarbamate, BocText).AllRulesRan();

        // Summed per environment, no signal is "read as" a rounded count.
        Assert.DoesNotContain("fractional-count", report.Codes("integral-ratio"));
    }

    [Fact]
    public void Check_RotamerMixtureMissingAnEnvironment_StillDrawsTotalMismatch()
    {
        // The same mixture with the minor N-methyl signal dropped: the N-CH3 environment now adds up to 1.8 H,
        // which no whole number of protons explains; the total must not pass by rounding.
        var text = BocText.Replace(" 2.80 (br s, 1.2H, minor rotamer),", "", StringComparison.Ordinal);
        var report = BuiltInRules.Check(BocCarbamate, text).AllRulesRan();

        Assert.NotEmpty(report.Codes("integral-ratio"));
    }

    [Fact]
    public void Check_AmideRotamerMixture64_NoIntegralFinding()
    {
        // N-Benzyl-N-methylacetamide, C10H13NO (13 H), 6:4 rotamers (typical values, from memory).
        var report = BuiltInRules.Check("CN(Cc1ccccc1)C(C)=O",
            "1H NMR (400 MHz, CDCl3) δ 7.38–7.15 (m, 5H), 4.59 (s, 1.2H, major), 4.53 (s, 0.8H, minor), " +
            "2.94 (s, 1.8H, major), 2.93 (s, 1.2H, minor), 2.17 (s, 1.8H, major), 2.14 (s, 1.2H, minor).").AllRulesRan();

        Assert.DoesNotContain(report.Findings, f => f.Finding.Severity >= Severity.Warning);
    }
}
