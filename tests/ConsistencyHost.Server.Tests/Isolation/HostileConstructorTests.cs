using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// Code a plugin runs before it checks anything — static constructor, constructor, options validation — never
/// runs in the host. The fixture that reached the file system and the process from its constructors through
/// reflection is refused at vetting now (the allow-list), so none of it runs anywhere; a plugin that passes
/// vetting is described, bound and run by a worker (tests/fixtures/workers), and one whose static constructor
/// overflows the stack ends only the worker. The test process is the host, so a constructor run here would end
/// the test run.
/// </summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")] // workers rely on prlimit, unshare and setpriv
public sealed class HostileConstructorTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    private static readonly string[] Plugins = ["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.HostileConstructorRule"];

    [Fact]
    public async Task Start_ConstructorsReachingTheProcessThroughReflection_AreRefusedAtVettingAndNeverRun()
    {
        string marker;
        await using (var host = await RunningHost.StartAsync(Plugins))
        {
            marker = MarkerPath(host.PluginsPath);
            var client = new EntryCheck.EntryCheckClient(host.Channel);

            var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
            var report = await client.CheckEntryAsync(Requests.MissingSolvent("HC-1"), deadline: DateTime.UtcNow + CallTimeout);

            var refused = Assert.Single(rules.Rules, r => r.Plugin == "ConsistencyHost.Fixtures.HostileConstructorRule.dll");
            Assert.Equal(RuleLoadStatus.Refused, refused.LoadStatus);
            Assert.Contains("CHSDK1002", refused.LoadMessage, StringComparison.Ordinal);
            Assert.Contains("System.Linq.Expressions.Expression.Call", refused.LoadMessage, StringComparison.Ordinal);
            Assert.Equal("spectrum-metadata", Assert.Single(report.RuleRuns).RuleId);
            Assert.Equal("solvent-not-stated", Assert.Single(report.Findings).Code);
        }

        // Neither the host nor a worker ran any of the fixture's constructors: no marker line was left.
        Assert.False(File.Exists(marker), $"a constructor of the refused fixture ran and wrote {marker}");
    }

    [Fact]
    public async Task Start_SourcePluginWithOptions_IsDescribedBoundAndRunByAWorker()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], folderCreated: DropWorkerFixture("Worker.BoundOptions"));
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
        var report = await client.CheckEntryAsync(Requests.MissingSolvent("HC-2"), deadline: DateTime.UtcNow + CallTimeout);

        var rule = Assert.Single(rules.Rules, r => r.Id == "fixture-bound-options");
        Assert.Equal(RuleLoadStatus.Loaded, rule.LoadStatus);
        Assert.Equal("worker", rule.Isolation);
        Assert.Equal(RuleRunStatus.Ok, report.RuleRuns.Single(r => r.RuleId == "fixture-bound-options").Status);
        Assert.Contains(report.Findings, f => f.Code == "ran-in-worker" && f.Message == "ran with limit 3");
    }

    [Fact]
    public async Task Start_BadOptionsOfAWorkerDescribedRule_AreStartUpErrorsWithTheBindersMessages()
    {
        using var config = await HostileConfig.WriteAsync("""
            { "ConsistencyHost": { "Profiles": { "strict": { "Rules": {
                "fixture-bound-options": { "Options": { "Limit": "99", "Colour": "red" } } } },
              "odd": { "Rules": { "fixture-bound-options": { "Options": { "Limit": "7" } } } } } } }
            """);
        string? folder = null;
        var error = await Assert.ThrowsAsync<ConsistencyHost.Engine.Profiles.ProfileConfigurationException>(async () =>
        {
            await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], config.Path, path =>
            {
                folder = path;
                DropWorkerFixture("Worker.BoundOptions")(path);
            });
        });

        // The same sentences the host's binder gives a trusted rule: data annotations, unknown option, Validate.
        Assert.Contains("profile 'strict', rule 'fixture-bound-options': has no option 'Colour'; known options: Limit", error.Problems);
        Assert.Contains("profile 'strict', rule 'fixture-bound-options': The field Limit must be between 1 and 10.", error.Problems);
        Assert.Contains("profile 'odd', rule 'fixture-bound-options': Limit 7 is reserved", error.Problems);
        // The host that refused to start killed the workers that described its plugins.
        Assert.Empty(WorkerProcesses.Running(folder!));
    }

    [Fact]
    public async Task Start_WorkerDiesWhileLoadingThePlugin_PluginRefusedWithTheReasonAndHostServes()
    {
        string pluginsPath;
        await using (var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"],
                         folderCreated: DropWorkerFixture("Worker.OverflowingStaticConstructor")))
        {
            pluginsPath = host.PluginsPath;
            var client = new EntryCheck.EntryCheckClient(host.Channel);

            var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
            var report = await client.CheckEntryAsync(Requests.MissingSolvent("HC-3"), deadline: DateTime.UtcNow + CallTimeout);

            var refused = Assert.Single(rules.Rules, r => r.Plugin == "Worker.OverflowingStaticConstructor (source)");
            Assert.Equal(RuleLoadStatus.Refused, refused.LoadStatus);
            Assert.StartsWith("could not be described by its worker: ", refused.LoadMessage, StringComparison.Ordinal);
            Assert.Contains("Stack overflow", refused.LoadMessage, StringComparison.Ordinal);
            Assert.Equal("solvent-not-stated", Assert.Single(report.Findings).Code);
        }

        Assert.Empty(WorkerProcesses.Running(pluginsPath));
    }

    private static Action<string> DropWorkerFixture(string name) => pluginsPath =>
        PluginFolder.CopySourcePlugin(pluginsPath, Path.Combine(RepoPaths.Root, "tests", "fixtures", "workers", name));

    /// <summary>Where the fixture would leave its marker (see HostileActs.MarkerPath): named after the plugin folder.</summary>
    private static string MarkerPath(string pluginsPath) =>
        Path.Combine("/tmp", "ch-hostile-ctor-" + Path.GetFileName(pluginsPath) + ".txt");
}
