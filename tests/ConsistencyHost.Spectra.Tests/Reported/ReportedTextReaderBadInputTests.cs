using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Reported;
using M = ConsistencyHost.Spectra.Reported.ReportedTextMessages;

namespace ConsistencyHost.Spectra.Tests.Reported;

/// <summary>
/// Malformed text: each row names the offset, the fragment and the expectation, and the full message is checked
/// against <see cref="ReportedTextMessages.Describe"/>. Well-formed parts follow the ACS form (Common practice).
/// </summary>
public sealed class ReportedTextReaderBadInputTests
{
    private const string H = "1H NMR (400 MHz, CDCl3) δ ";

    public static TheoryData<string, int, string, string> Rows => new()
    {
        { H + "7.26 (s, 1H) 2.05 (s, 3H).", 39, "2.05 (s, 3H).", M.ExpectedSeparator },
        { H + "7.26 (sx, 1H).", 32, "sx", M.ExpectedDetail },
        { H + "7.26 (s, 1H.", 31, "(s, 1H.", M.ExpectedDetailsClose },
        { H + "abc (s, 1H).", 26, "abc (s, 1H).", M.ExpectedShift },
        { H + "7.26– (m, 2H).", 32, "(m, 2H).", M.ExpectedRangeEnd },
        { H + "7.26 (d, J = Hz, 1H).", 39, "Hz", M.ExpectedCouplingValue },
        { H + "7.26 (d, J = 8.0 Hx, 1H).", 43, "Hx", M.ExpectedDetail },
        { H + "7.26 (s, d, 1H).", 35, "d", M.ExpectedOneMultiplicity },
        { H + "7.26 (s, 1H, 2H).", 39, "2H", M.ExpectedOneCount },
        { H + "7.26 (8.0, 1H).", 32, "8.0", M.ExpectedCouplingContext },
        { H + "7,26 (s, 1H), 2.05 (s, 3H).", 40, "2.05 (s, 3H).", M.ExpectedUnambiguousDecimal },
        { H + "7.26 (s, 1H), 7,20 (s, 1H).", 40, "7,20 (s, 1H).", M.ExpectedUnambiguousDecimal },
        { "1H NMR (400 MHz, CDX) δ 7.26 (s, 1H).", 17, "CDX", M.ExpectedHeaderItem },
        { "1H NMR (400 MHz, CDCl3 δ 7.26 (s, 1H).", 7, "(400 MHz, CDCl3 δ 7.26 (s, 1H)", M.ExpectedHeaderClose },
        { "1H NMR (400 MHz, CDCl3) δ.", 25, ".", M.ExpectedShift },
        { "1H NMR (400 MHz, CDCl3) δ", 25, "", M.ExpectedSignals },
        { "Product 5. " + H + "7.26 (s, 1H).", 0, "Product 5.", M.ExpectedHeader },
        { H + "7.26 (s, 1H), then something.", 40, "then something.", M.ExpectedShift },
        { H + "7.26 (s, , 1H).", 35, ",", M.ExpectedDetail },
        { H + "7.26 (s, 1H, xyz).", 39, "xyz", M.ExpectedDetail },
        { H + "7.26 (q J = 7.1 Hz, 2H).", 32, "q J = 7.1 Hz", M.ExpectedDetail },
        { H + "7.26 (d, J = 7.1 and Hz, 2H).", 47, "Hz", M.ExpectedCouplingValue },
        { H + "4.12 (q, J = 7.1 Hz, 2H), (s, 3H).", 52, "(s, 3H).", M.ExpectedShift },
        { H + "7.26 (s, 1H), 7.0 - (d, 1H).", 46, "(d, 1H).", M.ExpectedRangeEnd },
        { "1H NMR (400 MHz, 25 °F) δ 7.26 (s, 1H).", 17, "25 °F", M.ExpectedHeaderItem },
        { "13C NMR (101 MHz, CDCl3) δ 171.1, 60.4, , 14.2.", 40, ", 14.2.", M.ExpectedShift },
        { "13C NMR (101 MHz, CDCl3) δ 171.1, 60.4; 21.0 14.2.", 45, "14.2.", M.ExpectedSeparator },
        { "13C NMR (101 MHz, CDCl3) δ 162.4 (d, J = -245.3 Hz).", 41, "-245.3 Hz", M.ExpectedCouplingValue },
        { "HRMS (ESI) m/z: [M + H]+ for C10H14NO2 180.1019; found 180.1016.", 25, "for C10H14NO2 180.1019; found", M.ExpectedHrmsCalculated },
        { "HRMS (ESI) m/z: [M + H]+ calcd for 180.1019; found 180.1016.", 35, "180.1019; found 180.1016.", M.ExpectedHrmsFormula },
        { "HRMS (ESI) m/z: [M + H]+ calcd for C10H14NO2; found 180.1016.", 44, "; found 180.1016.", M.ExpectedHrmsMz },
        { "HRMS (ESI) m/z: [M + H]+ calcd for C10H14NO2 180.1019; found n/a.", 61, "n/a.", M.ExpectedHrmsMz },
        { "HRMS (ESI) m/z: [M + H]+ calcd for C10H14NO2 180.1019; measured 180.1016.", 53, "; measured 180.1016.", M.ExpectedHrmsFound },
        // Lenient spellings stop where the text is not one: an unknown note, an unknown bracket, "found" without "requires".
        { H + "7.26 (s, 1H); OH missing.", 40, "OH missing.", M.ExpectedShift },
        { H + "7.26 (s, 1H) [see text].", 39, "[see text].", M.ExpectedSeparator },
        { H + "7.26 (ps x, 1H).", 32, "ps x", M.ExpectedDetail },
        { "HRMS (ESI) m/z: found 182.0810, C9H12NO2 182.0812.", 41, "182.0812.", M.ExpectedHrmsRequires },
        // The "Not read" list of docs/spectra.md, one row per entry not already above (negative J and a missing
        // separator are): each stays a problem rather than a guess.
        { H + "7.26 (s, 3), 2.05 (s, 3H).", 35, "3", M.ExpectedCountWithNucleus },
        { H + "7.26 (m, 5).", 35, "5", M.ExpectedCountWithNucleus },
        { H + "7.26 (d overlapped, 1H).", 32, "d overlapped", M.ExpectedDetail },
        { H + "2.05 (d, J, 3H).", 36, "", M.ExpectedCouplingValue },
        { H + "7.20 to 7.30 (m, 2H).", 31, "to 7.30 (m, 2H).", M.ExpectedSeparator },
        { "13C NMR (101 MHz, CDCl3) δ 128.3 (2), 77.0.", 34, "2", M.ExpectedCouplingContext },
        { H + "7.10À7.00 (m, 1H).", 30, "À7.00 (m, 1H).", M.ExpectedSeparator },
    };

    // Common practice: yield, mp and Rf prose before the NMR data. Strict refuses it; lenient skips it with a note.
    [Fact]
    public void Read_YieldProseBeforeHeader_StrictRefusesAndLenientSkips()
    {
        const string text = "Yield 85%. " + H + "7.26 (s, 1H).";
        var strict = Assert.Single(ReportedTextReader.Read(text).Problems);
        Assert.Equal((0, "Yield 85%.", M.ExpectedHeader), (strict.Offset, strict.Fragment, strict.Expected));
        var lenient = ReportedTextReader.Read(text, ReadMode.Lenient);
        Assert.Empty(lenient.Problems);
        Assert.Equal(("yield", 0), (Assert.Single(lenient.Skipped).Kind, lenient.Skipped[0].Offset));
        Assert.Single(Assert.Single(lenient.Spectra).Signals);
    }

    // Low-resolution MS lists after the NMR lists, as printed in published SI text (Fixtures/published-si-entries.tsv
    // si-023, si-169, si-218 of the rules tests): never read as signals, skipped with a note when lenient.
    [Theory]
    [InlineData("1H NMR (400 MHz, CDCl3) d 7.33 (d, 2H, J = 8.0 Hz), 2.43 (s, 3H); MS m/z (%): 331 (M+ + 2, 33.5), 329 (M+, 100), 294 (23).", 2)]
    [InlineData("13C NMR (100 MHz, CDCl3) δ 159.61, 55.28; EI-MS (m/z, relative intensity) 328 (M+, 100), 313 (15), 297 (12).", 2)]
    [InlineData("1H NMR (CDCl3/TMS) δ: 6.64 (d, J = 8.8 Hz, 2H), 6.77 (d, J = 8.8 Hz, 2H); MS m/z: 149 (M+).", 2)]
    public void Read_LowResolutionMsAfterTheList_IsSkippedNeverReadAsSignals(string text, int signals)
    {
        var lenient = ReportedTextReader.Read(text, ReadMode.Lenient);
        Assert.Empty(lenient.Problems);
        Assert.Equal(signals, Assert.Single(lenient.Spectra).Signals.Count);
        Assert.All(lenient.Spectra[0].Signals, s => Assert.True(s.ShiftPpm < 200));
        Assert.Equal("low-resolution MS", Assert.Single(lenient.Skipped).Kind);
        Assert.False(ReportedTextReader.Read(text).Succeeded);
    }

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_MalformedText_ReportsOneErrorWithOffsetFragmentAndExpectation(string text, int offset, string fragment, string expected)
    {
        var result = ReportedTextReader.Read(text);
        Assert.False(result.Succeeded);
        Assert.Empty(result.Spectra);
        var problem = Assert.Single(result.Problems);
        Assert.Equal((offset, fragment, expected, ProblemSeverity.Error), (problem.Offset, problem.Fragment, problem.Expected, problem.Severity));
        Assert.Equal(M.Describe(offset, fragment, expected), problem.Message);
    }

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_MalformedTextLenient_GivesTheSameProblemAsWarning(string text, int offset, string fragment, string expected)
    {
        var problem = Assert.Single(ReportedTextReader.Read(text, ReadMode.Lenient).Problems);
        Assert.Equal((offset, fragment, expected, ProblemSeverity.Warning), (problem.Offset, problem.Fragment, problem.Expected, problem.Severity));
    }

    [Fact]
    public void Read_LenientWithOneBadSignal_KeepsTheOthers()
    {
        var result = ReportedTextReader.Read(H + "7.26 (s, 1H), 7.10 (sx, 1H), 2.05 (s, 3H).", ReadMode.Lenient);
        Assert.True(result.Succeeded);
        Assert.Equal([7.26, 7.10, 2.05], result.Spectra.Single().Signals.Select(s => s.ShiftPpm!.Value));
        Assert.Equal(M.ExpectedDetail, Assert.Single(result.Problems).Expected);
    }

    [Fact]
    public void Read_TextOverLengthLimit_GivesLimitErrorEvenWhenLenient()
    {
        var options = ReportedTextOptions.Default with { MaxTextLength = 40 };
        var result = ReportedTextReader.Read(H + "7.26 (s, 1H), 2.05 (s, 3H).", ReadMode.Lenient, options);
        var problem = Assert.Single(result.Problems);
        Assert.Equal(ProblemSeverity.Error, problem.Severity);
        Assert.Equal(M.TextTooLong(53, 40), problem.Message);
    }

    [Fact]
    public void Read_SpectrumOverSignalLimit_GivesLimitError()
    {
        var options = ReportedTextOptions.Default with { MaxSignalsPerSpectrum = 2 };
        var result = ReportedTextReader.Read("13C NMR (101 MHz, CDCl3) δ 171.1, 60.4, 21.0, 14.2.", ReadMode.Lenient, options);
        var problem = Assert.Single(result.Problems);
        Assert.Equal(M.TooManySignals(40, 2), problem.Message);
        Assert.Equal(2, result.Spectra.Single().Signals.Count);
    }

    [Fact]
    public void Read_InlineItemEmptiedByTrimming_ReportsTheItemInsteadOfThrowing()
    {
        // Found by fuzzing (fuzz/run.sh reported): a form feed alone between the commas of a table-cell signal
        // ("1.65, m, 2H", source: PMC4199947 table Tab2) was trimmed to an empty item and threw IndexOutOfRangeException.
        var result = ReportedTextReader.Read(H + "1.65, m, \f, 2H.");
        Assert.False(result.Succeeded);
        Assert.Empty(result.Spectra);
        var first = result.Problems[0];
        Assert.Equal((35, "\f, 2H.", M.ExpectedShift), (first.Offset, first.Fragment, first.Expected));
    }

    [Fact]
    public void Read_DefaultLimits_AreTheDocumentedOnes()
    {
        Assert.Equal(200_000, ReportedTextOptions.Default.MaxTextLength);
        Assert.Equal(2_000, ReportedTextOptions.Default.MaxSignalsPerSpectrum);
    }
}
