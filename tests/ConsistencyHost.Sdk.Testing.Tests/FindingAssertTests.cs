using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Testing.Assertions;
using ConsistencyHost.Sdk.Testing.Running;

namespace ConsistencyHost.Sdk.Testing.Tests;

public sealed class FindingAssertTests
{
    private static readonly RuleRun OneFinding = new("lab-rule", RuleRunStatus.Ok,
        [new Finding("couplings-missing", Severity.Warning, "The doublet at 7.26 ppm lists no J.")], null);

    [Fact]
    public void HasCode_CodeAbsent_FailsListingWhatTheRuleProduced()
    {
        var error = Assert.Throws<FindingAssertException>(() => FindingAssert.HasCode(OneFinding, "solvent-not-stated"));

        Assert.Equal("Rule 'lab-rule': expected a finding with code 'solvent-not-stated'; it produced " +
                     "  couplings-missing (Warning): The doublet at 7.26 ppm lists no J.", error.Message);
    }

    [Fact]
    public void NoFindings_OneFinding_Fails() =>
        Assert.Throws<FindingAssertException>(() => FindingAssert.NoFindings(OneFinding));

    [Fact]
    public void LacksCode_OtherCodeOnly_Passes() =>
        FindingAssert.LacksCode(OneFinding, "solvent-not-stated");

    [Fact]
    public void HasCode_RunThatTimedOut_FailsNamingTheStatus()
    {
        var timedOut = new RuleRun("lab-rule", RuleRunStatus.TimedOut, [], null);

        var error = Assert.Throws<FindingAssertException>(() => FindingAssert.HasCode(timedOut, "couplings-missing"));

        Assert.Contains("expected the run to end Ok, but it ended TimedOut", error.Message);
    }
}
