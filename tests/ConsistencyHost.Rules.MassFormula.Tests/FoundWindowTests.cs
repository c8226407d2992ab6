using ConsistencyHost.Sdk.Findings;
using static ConsistencyHost.Rules.MassFormula.Tests.MassFormulaTestKit;

namespace ConsistencyHost.Rules.MassFormula.Tests;

/// <summary>
/// Found against calculated m/z. Window ±5 ppm: the ACS acceptance window for accurate mass, as quoted in a
/// third-party paraphrase of the ACS guidelines (nmr-data-standards.md §7.3).
/// </summary>
public sealed class FoundWindowTests(MassFormulaTestKit kit) : IClassFixture<MassFormulaTestKit>
{
    [Fact]
    public void Check_FoundSevenPpmHigh_WarnsInPpmAndMilliDaltons()
    {
        // Caffeine [M+H]+ 195.087652 (§7.3); 195.0890 − 195.087652 = 1.348 mDa = 6.91 ppm.
        var finding = Assert.Single(kit.Check(Caffeine, "HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0877; found 195.0890."));

        Assert.Equal("found-outside-window", finding.Code);
        Assert.Equal(Severity.Warning, finding.Severity);
        Assert.Equal("195.087652", Evidence(finding, "expected_mz"));
        Assert.Equal("195.0890", Evidence(finding, "found_mz"));
        Assert.Equal("6.91", Evidence(finding, "difference_ppm"));
        Assert.Equal("1.35", Evidence(finding, "difference_mda"));
        Assert.Equal("5", Evidence(finding, "window_ppm"));
    }

    [Theory]
    // 195.0880 is +1.78 ppm and 195.0862 is −7.45 ppm from 195.087652 (§7.3).
    [InlineData("195.0880", false)]
    [InlineData("195.0862", true)]
    // Source: §7.3 ACS-style example: C12H15NO3Na+ 244.094414; 244.0941 is −1.29 ppm, 244.0957 is +5.27 ppm.
    [InlineData("244.0941", false)]
    [InlineData("244.0957", true)]
    public void Check_FoundNearWindowEdge_FlaggedOnlyOutside(string found, bool flagged)
    {
        var (smiles, text) = found.StartsWith("244", StringComparison.Ordinal)
            ? (AcetylPhenylalanineMethylEster, $"HRMS (ESI-TOF) m/z: [M + Na]+ calcd for C12H15NO3Na 244.0944; found {found}.")
            : (Caffeine, $"HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0877; found {found}.");

        var findings = kit.Check(smiles, text);

        Assert.Equal(flagged ? ["found-outside-window"] : [], Codes(findings));
    }

    [Fact]
    public void Check_NoStructureNoFormula_FoundJudgedAgainstCalculated()
    {
        // Without M the reference is the author's value: 195.0890 vs 195.0877 is 6.66 ppm.
        var finding = Assert.Single(kit.Check(null, "HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0877; found 195.0890."));

        Assert.Equal("found-outside-window", finding.Code);
        Assert.Equal("6.66", Evidence(finding, "difference_ppm"));
        Assert.Empty(finding.Atoms);
    }
}
