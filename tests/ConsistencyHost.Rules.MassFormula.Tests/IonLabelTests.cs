using ConsistencyHost.Sdk.Findings;
using static ConsistencyHost.Rules.MassFormula.Tests.MassFormulaTestKit;

namespace ConsistencyHost.Rules.MassFormula.Tests;

/// <summary>Ion labels as authors write them (common practice), sent as structured claims so that forms the
/// text reader does not read are covered too.</summary>
public sealed class IonLabelTests(MassFormulaTestKit kit) : IClassFixture<MassFormulaTestKit>
{
    [Theory]
    [InlineData("[M+H]+")]
    [InlineData("[M + H]+")]
    [InlineData("(M+H)+")]
    [InlineData("[M+H]⁺")]
    [InlineData("MH+")]
    [InlineData("M+H+")]
    public void CheckClaim_ProtonatedLabelVariant_ReadAsProtonated(string label)
    {
        // Source: nmr-data-standards.md §7.3: caffeine [M+H]+ 195.087652, 195.088201 with the electron omitted.
        Assert.Empty(kit.CheckClaim(Caffeine, Claim(label, "C8H11N4O2", "195.0877")));
        var omitted = Assert.Single(kit.CheckClaim(Caffeine, Claim(label, "C8H11N4O2", "195.0882")));
        Assert.Equal("electron-mass-omitted", omitted.Code);
        Assert.Equal("[M+H]+", Evidence(omitted, "ion"));
    }

    [Theory]
    // Naphthalene M+• = 128.062600 − mₑ = 128.062052 (NIST masses, §7.1–7.3).
    [InlineData("M+•")]
    [InlineData("M⁺˙")]
    [InlineData("M•+")]
    [InlineData("[M]+")]
    [InlineData("M+")]
    public void CheckClaim_RadicalCationVariant_ReadAsMinusOneElectron(string label)
    {
        Assert.Empty(kit.CheckClaim(Naphthalene, Claim(label, "C10H8", "128.0621")));
    }

    [Fact]
    public void Check_ParenthesisedLabelInReportedText_ReadThroughToTheRule()
    {
        // Source: nmr-data-standards.md §7.3: caffeine [M+H]+ 195.087652, or 195.088201 with the electron omitted.
        Assert.Empty(kit.Check(Caffeine, "HRMS (ESI) m/z: (M+H)+ calcd for C8H11N4O2 195.0877; found 195.0874."));
        Assert.Equal("electron-mass-omitted", Assert.Single(kit.Check(Caffeine, "HRMS (ESI) m/z: (M+H)+ calcd for C8H11N4O2 195.0882.")).Code);
    }

    [Theory]
    // N,N'-Dibenzylethylenediamine [M+2H]2+ = (240.162649 + 2·1.00782503223 − 2·mₑ)/2 = 121.088601 (NIST masses, §7.1–7.3).
    [InlineData("[M+2H]2+")]
    [InlineData("[M+2H]²⁺")]
    [InlineData("[M+2H]+2")]
    public void CheckClaim_DoublyChargedVariant_DividedByTwo(string label)
    {
        Assert.Empty(kit.CheckClaim(DibenzylEthylenediamine, Claim(label, "C16H22N2", "121.0886")));
    }

    [Fact]
    public void CheckClaim_DimerSodiated_Recognised()
    {
        // Caffeine [2M+Na]+ = 2·194.080376 + 22.9897692820 − mₑ = 411.149972 (NIST masses, §7.1–7.3).
        Assert.Empty(kit.CheckClaim(Caffeine, Claim("[2M+Na]+", "C16H20N8NaO4", "411.1500")));
    }

    [Fact]
    public void CheckClaim_NoLabelButIonFormula_InfersTheIon()
    {
        // "calcd for C8H11N4O2 195.0877" without a label: the formula is caffeine + H, so [M+H]+ (§7.3).
        Assert.Empty(kit.CheckClaim(Caffeine, Claim(null, "C8H11N4O2", "195.0877")));
        Assert.Equal("electron-mass-omitted", Assert.Single(kit.CheckClaim(Caffeine, Claim(null, "C8H11N4O2", "195.0882"))).Code);
    }

    [Theory]
    [InlineData("[M+ACN+H]+", "'ACN'")]
    [InlineData("[M+Na]−", "does not follow")]
    [InlineData("[M−Cl]+", "removes more Cl")]
    [InlineData("M+H", "is not an ion label")]
    public void CheckClaim_UnknownOrImpossibleIon_InfoAndValueNotChecked(string label, string because)
    {
        // The value is far from anything caffeine gives, yet only the label is reported: it cannot be judged.
        var finding = Assert.Single(kit.CheckClaim(Caffeine, Claim(label, "C8H11N4O2", "236.1142")));

        Assert.Equal("ion-not-recognised", finding.Code);
        Assert.Equal(Severity.Info, finding.Severity);
        Assert.Contains(because, finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_UnknownIonInReportedText_StillChecksFoundAgainstCalculated()
    {
        // 236.1142 vs 236.1242 is 42 ppm: the found value is judged against the author's own calculated value.
        var codes = Codes(kit.Check(Caffeine, "HRMS (ESI) m/z: [M+X]+ calcd for C8H11N4O2 236.1142; found 236.1242."));

        Assert.Equal(["found-outside-window", "ion-not-recognised"], codes);
    }
}
