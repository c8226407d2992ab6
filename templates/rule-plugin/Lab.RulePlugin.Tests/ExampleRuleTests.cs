using ConsistencyHost.Sdk.Testing.Assertions;
using ConsistencyHost.Sdk.Testing.Entries;
using ConsistencyHost.Sdk.Testing.Running;

namespace Lab.RulePlugin.Tests;

public sealed class ExampleRuleTests
{
    // Ethyl acetate in CDCl3: 4.12 (q, J = 7.1 Hz, 2H), 2.05 (s, 3H), 1.26 (t, J = 7.1 Hz, 3H).
    // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (Table 1).
    private static readonly ConsistencyHost.Sdk.Entries.Entry EthylAcetate = EntryBuilder.Entry("AIS-LQ-0430").Smiles("CCOC(C)=O")
        .Spectrum(SpectrumBuilder.Proton(400, "CDCl3").Signal(4.12, "q", 2, 7.1).Signal(2.05, "s", 3).Signal(1.26, "t", 3, 7.1))
        .Build();

    [Fact]
    public void Check_ThreeSignalsWithDefaults_NoFindings() =>
        FindingAssert.NoFindings(RuleHarness.Run<ExampleRule>(EthylAcetate));

    [Fact]
    public void Check_FewerSignalsThanTheProfileAsks_ReportsTooFewSignals()
    {
        var run = RuleHarness.Run<ExampleRule>(EthylAcetate, new Dictionary<string, string> { ["MinimumSignals"] = "4" });

        var finding = FindingAssert.HasSingle(run, ExampleCodes.TooFewSignals);
        Assert.Equal("The 1H spectrum lists 3 signal(s); at least 4 expected.", finding.Message);
    }
}
