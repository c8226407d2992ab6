using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// Source plugins that attack the compiler (tests/fixtures/hostile-source) beside a clean source plugin and a
/// built-in rule in the real host with workers on: the host starts, the hostile plugin is refused with the limit
/// that stopped its compiler, the clean source plugin runs in its worker, and checks come back right.
/// </summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")] // workers rely on prlimit, unshare and setpriv
public sealed class SourceCompileTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    [Fact]
    public async Task Start_SourcePluginWhoseConstantOutgrowsTheCompilerHeap_IsRefusedAndHostServes()
    {
        var refusal = await RefusalBesideCleanPluginsAsync("Hostile.ConstantBomb", "hostile-constant-bomb", compileTimeoutSeconds: 300);

        // The worker's managed heap limit stops the folding: either an analyzer's OutOfMemoryException (AD0001, as
        // measured here) or the compiler process dying, which the refusal names with the heap limit.
        Assert.True(refusal.Contains("AD0001", StringComparison.Ordinal) && refusal.Contains("OutOfMemoryException", StringComparison.Ordinal)
                    || refusal.Contains("compiler-failure", StringComparison.Ordinal) && refusal.Contains("Isolation:CompileHeapMegabytes", StringComparison.Ordinal),
            refusal);
    }

    [Fact]
    public async Task Start_SourcePluginWhoseLambdasKeepTheCompilerBusy_IsRefusedAtTheTimeLimit()
    {
        // 45 s: several times what the clean plugin needs in a fresh process on a loaded machine, and a small part of
        // the minutes the maze takes; the fixture's README gives the measurements.
        var refusal = await RefusalBesideCleanPluginsAsync("Hostile.LambdaMaze", "hostile-lambda-maze", compileTimeoutSeconds: 45);

        Assert.Contains("compile-time-limit", refusal, StringComparison.Ordinal);
        Assert.Contains("took longer than the limit of 45 s", refusal, StringComparison.Ordinal);
        Assert.Contains("the compiler process was killed", refusal, StringComparison.Ordinal);
    }

    /// <summary>Starts the host with the hostile source plugin, the clean one and a built-in rule; returns the hostile one's refusal.</summary>
    private static async Task<string> RefusalBesideCleanPluginsAsync(string hostileFolder, string hostileId, int compileTimeoutSeconds)
    {
        using var config = await HostileConfig.WriteAsync($$"""
            { "ConsistencyHost": { "RuleDeadlineMs": 60000, "Isolation": { "CompileTimeoutSeconds": {{compileTimeoutSeconds}} } } }
            """);
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], config.Path, folder =>
        {
            CopySource(Path.Combine(RepoPaths.Root, "tests", "fixtures", "hostile-source", hostileFolder), Path.Combine(folder, hostileFolder));
            CopySource(Path.Combine(RepoPaths.Root, "tests", "fixtures", "vetting", "Vetting.Good"), Path.Combine(folder, "Vetting.Good"));
        });
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
        var first = await client.CheckEntryAsync(Requests.MissingSolvent("SC-1"), deadline: DateTime.UtcNow + CallTimeout);
        var second = await client.CheckEntryAsync(Requests.Complete("SC-2"), deadline: DateTime.UtcNow + CallTimeout);

        var hostile = Assert.Single(rules.Rules, r => r.Plugin == hostileFolder + " (source)");
        Assert.Equal(RuleLoadStatus.Refused, hostile.LoadStatus);
        Assert.Equal(hostileFolder, hostile.Id); // refused before any rule id was known
        Assert.DoesNotContain(rules.Rules, r => r.Id == hostileId);
        var clean = Assert.Single(rules.Rules, r => r.Id == "vetting-good");
        Assert.Equal(RuleLoadStatus.Loaded, clean.LoadStatus);
        Assert.Equal("worker", clean.Isolation);
        // The built-in rule reports only what each entry lacks; the clean source plugin ran (no split signal, no finding).
        Assert.Equal("solvent-not-stated", Assert.Single(first.Findings).Code);
        Assert.Empty(second.Findings);
        Assert.Equal(RuleRunStatus.Ok, Assert.Single(first.RuleRuns, r => r.RuleId == "vetting-good").Status);
        Assert.Equal(RuleRunStatus.Ok, Assert.Single(second.RuleRuns, r => r.RuleId == "vetting-good").Status);
        Assert.StartsWith("refused by source vetting: ", hostile.LoadMessage, StringComparison.Ordinal);
        return hostile.LoadMessage;
    }

    private static void CopySource(string from, string to)
    {
        foreach (var file in Directory.EnumerateFiles(from, "*.cs"))
        {
            PluginFolder.WriteFile(Path.Combine(to, Path.GetFileName(file)), File.ReadAllText(file));
        }
    }
}
