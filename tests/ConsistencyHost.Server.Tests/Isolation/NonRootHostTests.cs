using System.Globalization;
using System.Runtime.Versioning;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Tests.Shared;
using Grpc.Net.Client;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// The real host (the built CLI's <c>serve</c>) started as an unprivileged user, as the shipped Dockerfile runs it:
/// it cannot give workers uids of their own, so it refuses every untrusted plugin — compiled or source — at start,
/// naming what is missing, and never runs one with its own uid; the trusted built-in rule still runs (issue 14 item 2).
/// </summary>
[SupportedOSPlatform("linux")] // setpriv and /proc
public sealed class NonRootHostTests
{
    /// <summary>An unprivileged uid (and gid) with no account: no capabilities, no groups, outside the workers' range.</summary>
    private const int HostUid = 64999;

    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    [Fact]
    public async Task Start_NonRootHostWithUntrustedPlugins_RefusesThemNamingWhatIsMissingAndServesTheBuiltInRule()
    {
        // Starting the host as another user needs root; CI runs as root, a developer's machine may not.
        if (!Environment.IsPrivilegedProcess) return;
        using var plugins = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.ThrowingRule");
        PluginFolder.CopySourcePlugin(plugins.Path, Path.Combine(RepoPaths.Root, "tests", "fixtures", "workers", "Worker.BoundOptions"));
        var home = PluginFolder.CreateFolder(Path.Combine(Path.GetTempPath(), $"ch-nonroot-home-{Guid.NewGuid():N}"));
        try
        {
            Assert.Equal(0, (await ChildProcess.RunAsync("chown", [$"{HostUid}:{HostUid}", home])).ExitCode);
            using var host = await ServeProcess.StartAsync(["--plugins", plugins.Path],
                new Dictionary<string, string> { ["HOME"] = home, ["DOTNET_CLI_HOME"] = home, ["TMPDIR"] = home },
                ["/usr/bin/setpriv", $"--reuid={HostUid}", $"--regid={HostUid}", "--clear-groups", "--no-new-privs"]);
            using var channel = GrpcChannel.ForAddress(host.Grpc);
            var client = new EntryCheck.EntryCheckClient(channel);

            var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);
            var report = await client.CheckEntryAsync(Requests.MissingSolvent("NONROOT-1"), deadline: DateTime.UtcNow + CallTimeout);

            Assert.Contains($"Uid:\t{HostUid}\t{HostUid}", await File.ReadAllTextAsync($"/proc/{host.ProcessId}/status"), StringComparison.Ordinal);
            foreach (var id in new[] { "ConsistencyHost.Fixtures.ThrowingRule", "Worker.BoundOptions" })
            {
                var refused = Assert.Single(rules.Rules, r => r.Id == id);
                Assert.Equal(RuleLoadStatus.Refused, refused.LoadStatus);
                Assert.Contains("untrusted plugins run only in isolated workers, and this host cannot start them: worker isolation needs the host to run as root",
                    refused.LoadMessage, StringComparison.Ordinal);
                Assert.Contains(string.Create(CultureInfo.InvariantCulture, $"this host runs as uid {HostUid} without CAP_CHOWN, CAP_DAC_OVERRIDE, CAP_KILL, CAP_SETGID, CAP_SETUID"),
                    refused.LoadMessage, StringComparison.Ordinal);
                Assert.EndsWith("the plugin was not run", refused.LoadMessage, StringComparison.Ordinal);
            }

            // No worker was ever started for this plugin folder, so nothing ran with the host's uid; the built-in rule answers.
            Assert.Empty(WorkerProcesses.Running(plugins.Path));
            Assert.Equal("in-process", Assert.Single(rules.Rules, r => r.Id == "spectrum-metadata").Isolation);
            Assert.Equal("solvent-not-stated", Assert.Single(report.Findings).Code);
            Assert.Equal(["spectrum-metadata"], report.RuleRuns.Select(r => r.RuleId));
            Assert.False(host.HasExited);
        }
        finally
        {
            Directory.Delete(home, recursive: true);
        }
    }
}
