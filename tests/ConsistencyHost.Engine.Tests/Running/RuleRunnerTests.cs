using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Running;

public sealed class RuleRunnerTests
{
    // Generous default deadline so a slow shared machine never times out a well-behaved rule; only the
    // runaway fixture gets a short one.
    private static CheckEngine EngineWithFixtures(PluginFolder folder) => new(new EngineOptions
    {
        PluginsPath = folder.Path,
        RuleDeadline = TimeSpan.FromSeconds(30),
        Profiles =
        [
            new Engine.Profiles.Profile
            {
                Name = "default",
                Rules = new Dictionary<string, Engine.Profiles.RuleSettings> { ["fixture-loops"] = new() { Deadline = TimeSpan.FromMilliseconds(300) } },
            },
        ],
    });

    [Fact]
    public void Check_RuleThatThrows_IsFailedAndOtherFindingsKept()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.ThrowingRule", "ConsistencyHost.Fixtures.LoopingRule");
        var engine = EngineWithFixtures(folder);

        var report = engine.Check(EngineTestKit.Entry(EngineTestKit.ProtonSpectrum(solvent: null)));

        var failed = Assert.Single(report.RuleRuns, r => r.RuleId == "fixture-throws");
        Assert.Equal(RuleRunStatus.Failed, failed.Status);
        Assert.Contains("fixture failure on purpose", failed.Message, StringComparison.Ordinal);
        Assert.Equal("solvent-not-stated", Assert.Single(report.Findings).Finding.Code);
    }

    [Fact]
    public void Check_RuleThatLoopsForever_TimesOutAndEngineKeepsAnswering()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.LoopingRule");
        var engine = EngineWithFixtures(folder);

        var first = engine.Check(EngineTestKit.Entry(EngineTestKit.ProtonSpectrum(solvent: null)));
        var second = engine.Check(EngineTestKit.Entry(EngineTestKit.ProtonSpectrum(mhz: null)));

        Assert.Equal(RuleRunStatus.TimedOut, Assert.Single(first.RuleRuns, r => r.RuleId == "fixture-loops").Status);
        Assert.Equal("solvent-not-stated", Assert.Single(first.Findings).Finding.Code);
        // The runaway is still spinning, so it is skipped rather than given a second thread.
        var secondRun = Assert.Single(second.RuleRuns, r => r.RuleId == "fixture-loops");
        Assert.Equal(RuleRunStatus.Skipped, secondRun.Status);
        Assert.Equal("frequency-not-stated", Assert.Single(second.Findings).Finding.Code);
    }

    [Theory]
    [InlineData(false)] // untrusted without workers: run on a pool thread beside the others
    [InlineData(true)] // trusted: run inline on the request's thread
    public void Check_RuleThatThrowsItsOwnCancellation_IsFailedNotTimedOut(bool trusted)
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.CancellingRule");
        var engine = new CheckEngine(new EngineOptions
        {
            PluginsPath = folder.Path,
            RuleDeadline = TimeSpan.FromSeconds(30),
            TrustedPlugins = trusted
                ? new HashSet<string>(EngineOptions.BuiltInPlugins.Append("ConsistencyHost.Fixtures.CancellingRule"), StringComparer.Ordinal)
                : EngineOptions.BuiltInPlugins,
        });

        var first = engine.Check(EngineTestKit.Entry(EngineTestKit.ProtonSpectrum(solvent: null)));
        var second = engine.Check(EngineTestKit.Entry(EngineTestKit.ProtonSpectrum(mhz: null)));

        foreach (var report in new[] { first, second })
        {
            var run = Assert.Single(report.RuleRuns, r => r.RuleId == "fixture-cancels-itself");
            Assert.Equal(RuleRunStatus.Failed, run.Status);
            Assert.Equal("OperationCanceledException: the rule cancelled itself on purpose", run.Message);
        }

        Assert.Equal("solvent-not-stated", Assert.Single(first.Findings).Finding.Code);
        Assert.Equal("frequency-not-stated", Assert.Single(second.Findings).Finding.Code);
    }
}
