using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// With workers on, the host never loads an untrusted plugin: the fixture's static constructor, constructor and
/// options validation (each ends any process but a worker with Environment.FailFast, after leaving a marker line)
/// run only in its worker. The test process is the host, so a constructor run here would end the test run.
/// </summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")] // workers rely on prlimit, unshare and setpriv
public sealed class HostileConstructorTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    private static readonly string[] Plugins = ["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.HostileConstructorRule"];

    [Fact]
    public async Task Start_HostileConstructorsWithWorkersOn_RunOnlyInTheWorkerAndTheRuleRunsThere()
    {
        string marker;
        await using (var host = await RunningHost.StartAsync(Plugins))
        {
            marker = MarkerPath(host.PluginsPath);
            var client = new EntryCheck.EntryCheckClient(host.Channel);

            var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
            var report = await client.CheckEntryAsync(Requests.MissingSolvent("HC-1"), deadline: DateTime.UtcNow + CallTimeout);

            var hostile = Assert.Single(rules.Rules, r => r.Id == "fixture-hostile-constructor");
            Assert.Equal(RuleLoadStatus.Loaded, hostile.LoadStatus);
            Assert.Equal("worker", hostile.Isolation);
            Assert.Equal(RuleRunStatus.Ok, report.RuleRuns.Single(r => r.RuleId == "fixture-hostile-constructor").Status);
            Assert.Contains(report.Findings, f => f.Code == "ran-in-worker" && f.Message == "ran with limit 3");
        }

        try
        {
            var lines = (await File.ReadAllLinesAsync(marker)).Select(line => line.Split('|', 3)).ToList();
            // Every act ran, and every one of them in a rule worker, none in this (the host's) process.
            Assert.Equal(["constructor", "options-validation", "static-constructor"], lines.Select(l => l[0]).Distinct().Order(StringComparer.Ordinal));
            Assert.All(lines, line =>
            {
                Assert.NotEqual(Environment.ProcessId.ToString(System.Globalization.CultureInfo.InvariantCulture), line[1]);
                Assert.Contains("ConsistencyHost.Worker.dll", line[2], StringComparison.Ordinal);
            });
        }
        finally
        {
            File.Delete(marker);
        }
    }

    [Fact]
    public async Task Start_BadOptionsOfAWorkerDescribedRule_AreStartUpErrorsWithTheBindersMessages()
    {
        using var config = await HostileConfig.WriteAsync("""
            { "ConsistencyHost": { "Profiles": { "strict": { "Rules": {
                "fixture-hostile-constructor": { "Options": { "Limit": "99", "Colour": "red" } } } },
              "odd": { "Rules": { "fixture-hostile-constructor": { "Options": { "Limit": "7" } } } } } } }
            """);
        string? marker = null, folder = null;
        try
        {
            var error = await Assert.ThrowsAsync<ConsistencyHost.Engine.Profiles.ProfileConfigurationException>(async () =>
            {
                await using var host = await RunningHost.StartAsync(Plugins, config.Path, path => (folder, marker) = (path, MarkerPath(path)));
            });

            // The same sentences the host's binder gives a trusted rule: data annotations, unknown option, Validate.
            Assert.Contains("profile 'strict', rule 'fixture-hostile-constructor': has no option 'Colour'; known options: Limit", error.Problems);
            Assert.Contains("profile 'strict', rule 'fixture-hostile-constructor': The field Limit must be between 1 and 10.", error.Problems);
            Assert.Contains("profile 'odd', rule 'fixture-hostile-constructor': Limit 7 is reserved", error.Problems);
            // The host that refused to start killed the workers that described its plugins.
            Assert.Empty(WorkerProcesses.Running(folder!));
        }
        finally
        {
            if (marker is not null) File.Delete(marker);
        }
    }

    [Fact]
    public async Task Start_WorkerDiesWhileLoadingThePlugin_PluginRefusedWithTheReasonAndHostServes()
    {
        string pluginsPath, marker;
        // The fixture's static constructor ends its process when this file exists.
        await using (var host = await RunningHost.StartAsync(Plugins, folderCreated: path => File.WriteAllText(MarkerPath(path) + ".crash", "")))
        {
            pluginsPath = host.PluginsPath;
            marker = MarkerPath(pluginsPath);
            var client = new EntryCheck.EntryCheckClient(host.Channel);

            var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
            var report = await client.CheckEntryAsync(Requests.MissingSolvent("HC-2"), deadline: DateTime.UtcNow + CallTimeout);

            var refused = Assert.Single(rules.Rules, r => r.Plugin == "ConsistencyHost.Fixtures.HostileConstructorRule.dll");
            Assert.Equal(RuleLoadStatus.Refused, refused.LoadStatus);
            Assert.StartsWith("could not be described by its worker: ", refused.LoadMessage, StringComparison.Ordinal);
            Assert.Contains("asked to crash", refused.LoadMessage, StringComparison.Ordinal);
            Assert.Equal("solvent-not-stated", Assert.Single(report.Findings).Code);
        }

        try
        {
            Assert.Empty(WorkerProcesses.Running(pluginsPath));
            Assert.All(await File.ReadAllLinesAsync(marker), line => Assert.Contains("ConsistencyHost.Worker.dll", line, StringComparison.Ordinal));
        }
        finally
        {
            File.Delete(marker);
            File.Delete(marker + ".crash");
        }
    }

    /// <summary>Where the fixture leaves its marker (see HostileActs.MarkerPath): named after the plugin folder.</summary>
    private static string MarkerPath(string pluginsPath) =>
        Path.Combine("/tmp", "ch-hostile-ctor-" + Path.GetFileName(pluginsPath) + ".txt");
}
