using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Running;

/// <summary>
/// A rule with nothing to check ends as skipped with the reason, as the contract's <c>skipped</c> status promises;
/// an empty entry is never a clean pass. The built-in plugins are loaded from disk.
/// </summary>
public sealed class NothingToCheckTests
{
    private static readonly Lazy<CheckEngine> BuiltIn = new(() => new CheckEngine(new EngineOptions
    {
        PluginsPath = RepoPaths.BuiltInPlugins,
        RuleDeadline = TimeSpan.FromSeconds(30),
    }));

    [Fact]
    public void Check_EntryWithoutSpectraOrClaims_SkipsEveryRuleWithTheReason()
    {
        var report = BuiltIn.Value.Check(new EntrySubmission
        {
            EntryId = "AIS-LQ-T010",
            Structure = new StructureSource(StructureFormat.Smiles, "COc1ccc(cc1)C(C)=O"),
        });

        Assert.NotEmpty(report.RuleRuns);
        Assert.All(report.RuleRuns, run =>
        {
            Assert.Equal(RuleRunStatus.Skipped, run.Status);
            Assert.Equal("the entry has no spectra, no formula and no HRMS claim", run.Message);
        });
        Assert.Empty(report.Findings);
    }

    [Fact]
    public void Check_Only13C_SkipsTheProtonOnlyRulesAndRunsTheOthers()
    {
        var report = BuiltIn.Value.Check(EngineTestKit.Entry(EngineTestKit.CarbonSpectrum(101)) with
        {
            Structure = new StructureSource(StructureFormat.Smiles, "COc1ccc(cc1)C(C)=O"),
        });

        var integral = Assert.Single(report.RuleRuns, r => r.RuleId == "integral-ratio");
        Assert.Equal(RuleRunStatus.Skipped, integral.Status);
        Assert.Equal("the entry has no 1H spectrum", integral.Message);
        Assert.Equal(RuleRunStatus.Ok, Assert.Single(report.RuleRuns, r => r.RuleId == "signal-count").Status);
        Assert.Equal(RuleRunStatus.Ok, Assert.Single(report.RuleRuns, r => r.RuleId == "spectrum-metadata").Status);
    }
}
