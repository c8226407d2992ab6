using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Spectra.Tests.Reported;

public sealed class ReportedTextReaderHrmsTests
{
    // Source: ACS-style example "HRMS (ESI-TOF) m/z: [M + Na]+ calcd for C12H15NO3Na 244.0944" quoted in the
    // reference notes §7.3 (a public paraphrase of the ACS guidelines); found value invented for the form.
    [Fact]
    public void Read_AcsHrmsLine_GivesClaimWithDecimals()
    {
        var result = ReportedTextReader.Read("HRMS (ESI-TOF) m/z: [M + Na]+ calcd for C12H15NO3Na 244.0944; found 244.0941.");
        Assert.True(result.Succeeded);
        Assert.Equal(new HrmsClaim("ESI-TOF", "[M+Na]+", "C12H15NO3Na", 244.0944, 244.0941, 4, 4, 0), Assert.Single(result.Hrms));
    }

    // Common practice: "Calcd for …:", comma before "Found", label after m/z without colon.
    [Theory]
    [InlineData("HRMS (ESI) m/z [M+H]+ Calcd for C10H14NO2: 180.1019, Found 180.1016", "ESI", "[M+H]+", "C10H14NO2", 180.1019, 180.1016)]
    [InlineData("HRMS (ESI) m/z: [M + H]+ calcd for C10H14NO2 180.1019; found 180.1016.", "ESI", "[M+H]+", "C10H14NO2", 180.1019, 180.1016)]
    [InlineData("HRMS (APCI): m/z calc. for C10H14NO2 [M+H]+ 180.1019, found: 180.1022", "APCI", "[M+H]+", "C10H14NO2", 180.1019, 180.1022)]
    [InlineData("HRMS (ESI) calculated for C8H11N4O2 [M+H]⁺ 195.0877, found 195.0875.", "ESI", "[M+H]+", "C8H11N4O2", 195.0877, 195.0875)]
    // Common practice: parentheses instead of brackets around the ion.
    [InlineData("HRMS (ESI) m/z: (M+H)+ calcd for C8H11N4O2 195.0877; found 195.0875.", "ESI", "(M+H)+", "C8H11N4O2", 195.0877, 195.0875)]
    // Common practice: en dash for minus in negative-mode ions, as typeset by word processors.
    [InlineData("HRMS (ESI) m/z: [M–H]– calcd for C9H7O4 179.0350; found 179.0347.", "ESI", "[M-H]-", "C9H7O4", 179.0350, 179.0347)]
    // Common practice: superscript charge on a doubly charged ion.
    [InlineData("HRMS (ESI) m/z: [M+2H]²⁺ calcd for C16H20N2O2 136.0757; found 136.0755.", "ESI", "[M+2H]2+", "C16H20N2O2", 136.0757, 136.0755)]
    // Common practice: the older "MH+" and "MNa+" shorthand.
    [InlineData("HRMS (FAB) m/z MH+ calcd for C8H11N4O2 195.0877, found 195.0880.", "FAB", "MH+", "C8H11N4O2", 195.0877, 195.0880)]
    [InlineData("HRMS (ESI) m/z MNa+ calcd for C12H15NO3Na 244.0944, found 244.0941.", "ESI", "MNa+", "C12H15NO3Na", 244.0944, 244.0941)]
    // Common practice: a comma between the formula and the calculated value.
    [InlineData("HRMS (ESI) m/z: [M + H]+ calcd for C8H11N4O2, 195.0877; found 195.0875.", "ESI", "[M+H]+", "C8H11N4O2", 195.0877, 195.0875)]
    // Common practice: the ion in parentheses right after HRMS, no ionisation named.
    [InlineData("HRMS (M+H)+ calcd for C8H11N4O2 195.0877, found 195.0875.", null, "(M+H)+", "C8H11N4O2", 195.0877, 195.0875)]
    // Common practice (issue 13): a decimal comma, subscript and superscript formulas, the bracketed ion formula.
    [InlineData("HRMS (ESI) m/z: [M + H]+ calcd for C10H14NO2 180,1019; found 180,1016.", "ESI", "[M+H]+", "C10H14NO2", 180.1019, 180.1016)]
    [InlineData("HRMS (ESI) m/z: [M+H]⁺ calcd for C₈H₁₁N₄O₂⁺ 195.0877; found 195.0875.", "ESI", "[M+H]+", "C8H11N4O2+", 195.0877, 195.0875)]
    [InlineData("HRMS (ESI) m/z: calcd for [C9H12NO2]+ 182.0812; found 182.0810.", "ESI", null, "C9H12NO2+", 182.0812, 182.0810)]
    // Common practice: the RSC "found …, <formula> requires …" wording, and the mass error after the value.
    [InlineData("HRMS (ESI) m/z: found 182.0810 [M+H]+, C9H12NO2 requires 182.0812.", "ESI", "[M+H]+", "C9H12NO2", 182.0812, 182.0810)]
    [InlineData("HRMS (ESI): found [M+H]+ 182.0810. C9H12NO2 requires 182.0812", "ESI", "[M+H]+", "C9H12NO2", 182.0812, 182.0810)]
    [InlineData("HRMS (ESI) m/z: [M+H]+ calcd for C9H12NO2 182.0812; found 182.0810 (Δ = −1.1 ppm).", "ESI", "[M+H]+", "C9H12NO2", 182.0812, 182.0810)]
    [InlineData("HRMS (ESI) m/z: found 182.0810 (Δ = −1.1 ppm), C9H12NO2 requires 182.0812.", "ESI", null, "C9H12NO2", 182.0812, 182.0810)]
    // Published corpus rows (tests/ConsistencyHost.Rules.Tests/Fixtures/published-si-entries.tsv), as printed.
    [InlineData("HRMS m/z (ESI) calcd. for C18H18NO3 [M+H]+: 296.1287; found 296.1274.", "ESI", "[M+H]+", "C18H18NO3", 296.1287, 296.1274)] // si-028
    [InlineData("HRMS (APCI-MS, positive): m/z = 396.0007. Calcd for C20H13IO: 396.0006 [M]+.", "APCI-MS, positive", "[M]+", "C20H13IO", 396.0006, 396.0007)] // si-140
    [InlineData("HRMS for C16H15BrO2: calcd 318.0255, found 318.0245.", null, null, "C16H15BrO2", 318.0255, 318.0245)] // si-205
    [InlineData("HRMS calcd for C16H10F3NO [M + H]+: 290.0787. Found: 290.0796.", null, "[M+H]+", "C16H10F3NO", 290.0787, 290.0796)] // si-021
    public void Read_HrmsVariant_GivesClaim(string text, string? ionisation, string? ion, string formula, double calcd, double found)
    {
        var result = ReportedTextReader.Read(text);
        Assert.True(result.Succeeded, string.Join("; ", result.Problems.Select(p => p.Message)));
        Assert.Empty(result.Problems);
        var claim = Assert.Single(result.Hrms);
        Assert.Equal((ionisation, ion, formula, calcd, (double?)found), (claim.Ionisation, claim.IonLabel, claim.IonFormula, claim.CalculatedMz, claim.FoundMz));
    }

    // Source: caffeine [M+H]+ calcd 195.0877 (reference notes §7.3 worked example, 195.087652 rounded).
    [Fact]
    public void Read_SpectraThenHrms_KeepsBothWithOffsets()
    {
        const string text = "1H NMR (400 MHz, CDCl3) δ 7.51 (s, 1H), 4.00 (s, 3H). HRMS (ESI) m/z: [M + H]+ calcd for C8H11N4O2 195.0877; found 195.0874.";
        var result = ReportedTextReader.Read(text);
        Assert.True(result.Succeeded);
        Assert.Equal(2, Assert.Single(result.Spectra).Signals.Count);
        Assert.Equal(text.IndexOf("HRMS", StringComparison.Ordinal), Assert.Single(result.Hrms).SourceOffset);
    }
}

public sealed class ReportedTextReaderOffsetTests
{
    // Common practice: two spectra in one experimental paragraph; offsets let the ELN highlight the text.
    [Fact]
    public void Read_SignalsAndSpectra_CarryTheirSourceOffsets()
    {
        const string text = "1H NMR (400 MHz, CDCl3) δ 7.31–7.24 (m, 5H), 4.12 (q, J = 7.1 Hz, 2H); 13C NMR (101 MHz, CDCl3) δ 171.1, 60.4.";
        var result = ReportedTextReader.Read(text);
        Assert.True(result.Succeeded);
        Assert.Equal([0, text.IndexOf("13C", StringComparison.Ordinal)], result.Spectra.Select(s => s.SourceOffset!.Value));
        Assert.Equal(
            [text.IndexOf("7.31", StringComparison.Ordinal), text.IndexOf("4.12", StringComparison.Ordinal),
             text.IndexOf("171.1", StringComparison.Ordinal), text.IndexOf("60.4", StringComparison.Ordinal)],
            result.Spectra.SelectMany(s => s.Signals).Select(s => s.SourceOffset!.Value));
    }
}
