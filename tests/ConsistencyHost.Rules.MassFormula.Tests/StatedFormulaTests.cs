using ConsistencyHost.Sdk.Findings;
using static ConsistencyHost.Rules.MassFormula.Tests.MassFormulaTestKit;

namespace ConsistencyHost.Rules.MassFormula.Tests;

/// <summary>The stated molecular formula against the structure (formulae checked with RDKit CalcMolFormula).</summary>
public sealed class StatedFormulaTests(MassFormulaTestKit kit) : IClassFixture<MassFormulaTestKit>
{
    [Theory]
    [InlineData(Acetanilide)]
    // N-Methylbenzamide is an isomer of acetanilide: the same formula, so the formula cannot tell them apart.
    [InlineData(MethylBenzamide)]
    public void Check_StatedFormulaOfStructureOrIsomer_NoFinding(string smiles)
    {
        Assert.Empty(kit.Check(smiles, "HRMS (ESI) m/z: [M+H]+ calcd for C8H10NO 136.0757; found 136.0759.", formula: "C8H9NO"));
    }

    [Fact]
    public void Check_StatedFormulaWithExtraOxygen_ErrorNamingTheOxygen()
    {
        // N-Methylbenzamide CNC(=O)c1ccccc1 is C8H9NO; C8H9NO2 has one O more. Atom 3 is its only oxygen.
        var finding = Assert.Single(kit.Check(MethylBenzamide, "HRMS (ESI) m/z: [M+H]+ calcd for C8H10NO 136.0757.", formula: "C8H9NO2"));

        Assert.Equal("formula-mismatch", finding.Code);
        Assert.Equal(Severity.Error, finding.Severity);
        Assert.Equal("C8H9NO", Evidence(finding, "expected_formula"));
        Assert.Equal("C8H9NO2", Evidence(finding, "reported_formula"));
        Assert.Equal([3], finding.Atoms);
    }

    [Theory]
    [InlineData("C8H9NO·HCl")]
    [InlineData("C8H9Xq")]
    public void Check_StatedFormulaUnreadable_WarnsWithReadersMessage(string formula)
    {
        var finding = Assert.Single(kit.Check(Acetanilide, "HRMS (ESI) m/z: [M+H]+ calcd for C8H10NO 136.0757.", formula: formula));

        Assert.Equal("formula-unreadable", finding.Code);
        Assert.Equal(Severity.Warning, finding.Severity);
        Assert.Contains(formula, finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_NoStructure_StatedFormulaServesAsM()
    {
        // Caffeine's formula stated, no structure: 195.0882 is still caffeine [M+H]+ without the electron (§7.3).
        var finding = Assert.Single(kit.Check(null, "HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0882.", formula: "C8H10N4O2"));

        Assert.Equal("electron-mass-omitted", finding.Code);
        Assert.Contains("the stated formula (C8H10N4O2)", finding.Message, StringComparison.Ordinal);
        Assert.Empty(finding.Atoms);
    }

    [Theory]
    // Neither structure nor formula: the written formula is read as the ion (C8H11N4O2+) or as M (C8H10N4O2 + H).
    [InlineData("HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0877.", new string[0])]
    [InlineData("HRMS (ESI) m/z: calcd for C8H10N4O2 [M+H]+ 195.0877.", new string[0])]
    [InlineData("HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0882.", new[] { "electron-mass-omitted" })]
    [InlineData("HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0921.", new[] { "calculated-mass-mismatch" })]
    public void Check_NoStructureNoFormula_CalculatedJudgedAgainstWrittenFormula(string text, string[] codes)
    {
        Assert.Equal(codes, Codes(kit.Check(null, text)));
    }
}
