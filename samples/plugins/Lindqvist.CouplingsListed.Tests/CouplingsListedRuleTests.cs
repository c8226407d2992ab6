using ConsistencyHost.Sdk.Testing.Assertions;
using ConsistencyHost.Sdk.Testing.Entries;
using ConsistencyHost.Sdk.Testing.Running;

namespace Lindqvist.CouplingsListed.Tests;

public sealed class CouplingsListedRuleTests
{
    // Ethyl acetate in CDCl3: 4.12 (q, J = 7.1 Hz, 2H), 2.05 (s, 3H), 1.26 (t, J = 7.1 Hz, 3H).
    // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (Table 1).
    private static SpectrumBuilder EthylAcetate(double[] quartetJ, double[] tripletJ) =>
        SpectrumBuilder.Proton(400, "CDCl3").Signal(4.12, "q", 2, quartetJ).Signal(2.05, "s", 3).Signal(1.26, "t", 3, tripletJ);

    [Fact]
    public void Check_EthylAcetateAsPublished_NoFindings()
    {
        var entry = EntryBuilder.Entry("AIS-LQ-0417").Smiles("CCOC(C)=O").Spectrum(EthylAcetate([7.1], [7.1])).Build();

        FindingAssert.NoFindings(RuleHarness.Run<CouplingsListedRule>(entry));
    }

    [Fact]
    public void Check_QuartetWithoutJ_ReportsMissingAtThatSignal()
    {
        var entry = EntryBuilder.Entry("AIS-LQ-0418").Smiles("CCOC(C)=O").Spectrum(EthylAcetate([], [7.1])).Build();

        var finding = FindingAssert.HasSingle(RuleHarness.Run<CouplingsListedRule>(entry), CouplingsListedCodes.Missing);

        Assert.Equal("The 1H signal at 4.12 ppm is reported as q but lists no coupling constant (J in Hz).", finding.Message);
        Assert.Equal([new ConsistencyHost.Sdk.Findings.PeakRef(0, 0)], finding.Peaks);
    }

    [Fact]
    public void Check_GuideExample_ReportsTheQuartetWithoutJ()
    {
        // The example of docs/plugin-authoring.md §4, verbatim (a test there checks it still is).
        var entry = EntryBuilder.Entry("AIS-LQ-0418").Smiles("CCOC(C)=O")
            .Spectrum(SpectrumBuilder.Proton(400, "CDCl3").Signal(4.12, "q", 2).Signal(2.05, "s", 3).Signal(1.26, "t", 3, 7.1))
            .Build();

        var run = RuleHarness.Run<CouplingsListedRule>(entry, new Dictionary<string, string> { ["RequireEveryCoupling"] = "true" });
        var finding = FindingAssert.HasSingle(run, CouplingsListedCodes.Missing);

        Assert.Equal(4.12, entry.Spectra[0].Signals[finding.Peaks[0].Signal].ShiftPpm);
    }

    [Fact]
    public void Check_DoubletOfDoubletsWithOneJ_ReportsIncompleteUnlessTheProfileRelaxesIt()
    {
        // 7.76 (dd, J 6.0, 8.2 Hz, 1H): the Acta Chimica Slovenica style page's example, here with one J dropped.
        // Source: Acta Chim. Slov., "Citing spectral and analytical data" (journal style page).
        var entry = EntryBuilder.Entry("AIS-LQ-0419").Spectrum(SpectrumBuilder.Proton(500, "DMSO-d6").Signal(7.76, "dd", 1, 8.2)).Build();

        var strict = FindingAssert.HasSingle(RuleHarness.Run<CouplingsListedRule>(entry), CouplingsListedCodes.Incomplete);
        var relaxed = RuleHarness.Run<CouplingsListedRule>(entry, new Dictionary<string, string> { ["RequireEveryCoupling"] = "false" });

        Assert.Contains("which has 2 coupling constants, but lists 1", strict.Message);
        FindingAssert.NoFindings(relaxed);
    }

    [Fact]
    public void Check_BroadSingletMultipletAndFullDd_NoFindings()
    {
        // The same style page's list: 0.85 (s), 1.28–1.65 (m), 7.41 (d, J 8.2 Hz), 7.76 (dd, J 6.0, 8.2 Hz), 8.09 (br s).
        // Source: Acta Chim. Slov., "Citing spectral and analytical data" (journal style page).
        var entry = EntryBuilder.Entry("AIS-LQ-0420").Spectrum(SpectrumBuilder.Proton(500, "DMSO-d6")
            .Signal(0.85, "s", 3).Range(1.28, 1.65, "m", 8).Signal(7.41, "d", 1, 8.2).Signal(7.76, "dd", 1, 6.0, 8.2).Signal(8.09, "br s", 1)).Build();

        FindingAssert.NoFindings(RuleHarness.Run<CouplingsListedRule>(entry));
    }

    [Fact]
    public void Check_BroadDoubletWithoutJ_ReportedUnlessBroadenedSignalsAreIgnored()
    {
        var entry = EntryBuilder.Entry("AIS-LQ-0421").Spectrum(SpectrumBuilder.Proton().Signal(6.52, "br d", 1)).Build();

        FindingAssert.HasSingle(RuleHarness.Run<CouplingsListedRule>(entry), CouplingsListedCodes.Missing);
        FindingAssert.NoFindings(RuleHarness.Run<CouplingsListedRule>(entry, new Dictionary<string, string> { ["IgnoreBroadened"] = "true" }));
    }

    [Fact]
    public void Check_CarbonSpectrum_IsNotLookedAt()
    {
        var entry = EntryBuilder.Entry("AIS-LQ-0423").Spectrum(SpectrumBuilder.Carbon().Line(171.36)).Build();

        FindingAssert.NoFindings(RuleHarness.Run<CouplingsListedRule>(entry));
    }
}
