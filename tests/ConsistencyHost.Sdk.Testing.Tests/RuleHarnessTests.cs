using ConsistencyHost.Sdk.Testing.Assertions;
using ConsistencyHost.Sdk.Testing.Entries;
using ConsistencyHost.Sdk.Testing.Running;

namespace ConsistencyHost.Sdk.Testing.Tests;

public sealed class RuleHarnessTests
{
    // Ethyl acetate in CDCl3: 4.12 (q, J = 7.1 Hz, 2H), 2.05 (s, 3H), 1.26 (t, J = 7.1 Hz, 3H).
    // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (Table 1).
    private static readonly ConsistencyHost.Sdk.Entries.Entry EthylAcetate = EntryBuilder.Entry("AIS-LQ-0501")
        .Smiles("CCOC(C)=O")
        .Formula("C4H8O2")
        .Spectrum(SpectrumBuilder.Proton(400, "CDCl3").Signal(4.12, "q", 2, 7.1).Signal(2.05, "s", 3).Signal(1.26, "t", 3, 7.1))
        .Build();

    [Fact]
    public void Run_DefaultOptions_NoFindingForThreeSignals() =>
        FindingAssert.NoFindings(RuleHarness.Run<SignalLimitRule>(EthylAcetate));

    [Fact]
    public void Run_OptionFromProfileText_IsBoundByNameCaseInsensitively()
    {
        var run = RuleHarness.Run<SignalLimitRule>(EthylAcetate, new Dictionary<string, string> { ["maxsignals"] = "2" });

        var finding = FindingAssert.HasSingle(run, SignalLimitRule.TooMany);
        Assert.Equal("3 signals, at most 2 expected.", finding.Message);
        Assert.Equal("kit-signal-limit", run.RuleId);
    }

    [Fact]
    public void Run_OptionOutOfRangeAndUnknown_ThrowsListingEveryProblem()
    {
        var options = new Dictionary<string, string> { ["MaxSignals"] = "0", ["Solvent"] = "CDCl3" };

        var error = Assert.Throws<ArgumentException>(() => RuleHarness.Run<SignalLimitRule>(EthylAcetate, options));

        Assert.Contains("has no option 'Solvent'; known options: MaxSignals", error.Message);
        Assert.Contains("The field MaxSignals must be between 1 and 100.", error.Message);
    }

    [Fact]
    public void Run_RuleThatThrows_IsFailedWithTheException()
    {
        var run = RuleHarness.Run<ThrowsRule>(EthylAcetate);

        Assert.Equal(RuleRunStatus.Failed, run.Status);
        Assert.Equal("broken on purpose", run.Error!.Message);
    }

    [Fact]
    public void Run_RuleThatRunsPastItsDeadline_IsTimedOut()
    {
        var run = RuleHarness.Run<SpinsRule>(EthylAcetate, deadline: TimeSpan.FromMilliseconds(20));

        Assert.Equal(RuleRunStatus.TimedOut, run.Status);
        Assert.Empty(run.Findings);
    }

    [Fact]
    public void Run_RuleWithoutMetadata_ThrowsBecauseTheHostWouldRefuseIt()
    {
        var error = Assert.Throws<ArgumentException>(() => RuleHarness.Run<UnlabelledRule>(EthylAcetate));

        Assert.Contains("UnlabelledRule has no [Rule] metadata", error.Message);
    }
}
