using System.Globalization;
using System.Runtime.Versioning;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Isolation;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// Under a root host every worker runs under a uid of its own from Isolation:WorkerUidRange, in a read-only view of
/// the file system except its private folder (issue 14 item 2). Vetting is an allow-list, so no plugin that passes it
/// can call kill, connect or open a path; these tests therefore act with exactly the credentials plugin code in worker
/// A would have if it got past vetting — A's uid and group, no supplementary groups, no capabilities, no_new_privs
/// (setpriv, as the host starts workers) and, for the file system, A's own mount namespace (nsenter) — and ask the
/// kernel what it allows. The uids and namespaces are read from the running workers under /proc, not assumed.
/// </summary>
[SupportedOSPlatform("linux")] // workers, setpriv, nsenter and /proc
public sealed class WorkerUidTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(120);

    [Fact]
    public async Task Start_TwoUntrustedPluginsUnderRootHost_EachWorkerHasItsOwnUidAndCannotReachTheOtherOrTheHost()
    {
        // Switching to a worker's uid needs root; CI runs as root, a developer's machine may not.
        if (!Environment.IsPrivilegedProcess) return;
        using var config = await HostileConfig.WriteAsync("""{ "ConsistencyHost": { "RuleDeadlineMs": 20000 } }""");
        File.SetUnixFileMode(config.Path, UnixFileMode.UserRead | UnixFileMode.UserWrite);
        await using var host = await RunningHost.StartAsync(
            ["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.ThrowingRule", "ConsistencyHost.Fixtures.CancellingRule"], config.Path);
        var workers = WorkerProcesses.Running(host.PluginsPath).Select(Worker.Read).ToList();

        Assert.Equal(2, workers.Count);
        var (a, b) = (workers[0], workers[1]);
        Assert.All(workers, w => Assert.True(UidRange.Default.Contains(w.Uid), $"worker uid {w.Uid} is outside {UidRange.Default}"));
        Assert.NotEqual(a.Uid, b.Uid);
        Assert.All(workers, w => Assert.Equal([w.Uid, w.Uid, w.Uid, w.Uid], w.Uids)); // real, effective, saved, file-system
        Assert.All(workers, w => Assert.Equal([w.Uid, w.Uid, w.Uid, w.Uid], w.Gids)); // the group of the same number

        // Control: as B itself, B's process and socket are there to reach.
        Assert.Equal(0, (await As(b, "/bin/sh", "-c", "kill -0 \"$0\"", Pid(b))).ExitCode);
        Assert.Equal(0, (await As(b, "/usr/bin/python3", "-c", Connect, b.Socket)).ExitCode);

        // As A: no signal to B or to the host, no connection to B's socket, no tracing B, no reading the host's 0600 file.
        var kill = await As(a, "/bin/sh", "-c", "kill -0 \"$0\"", Pid(b));
        Assert.NotEqual(0, kill.ExitCode);
        Assert.Contains("Operation not permitted", kill.Stderr, StringComparison.Ordinal);
        var killHost = await As(a, "/bin/sh", "-c", "kill -0 \"$0\"", Environment.ProcessId.ToString(CultureInfo.InvariantCulture));
        Assert.Contains("Operation not permitted", killHost.Stderr, StringComparison.Ordinal);
        var connect = await As(a, "/usr/bin/python3", "-c", Connect, b.Socket);
        Assert.NotEqual(0, connect.ExitCode);
        Assert.Contains("PermissionError", connect.Stderr, StringComparison.Ordinal);
        // /proc/PID/environ needs ptrace read access to B (ptrace(2), "Ptrace access mode checking").
        var trace = await As(a, "/bin/cat", $"/proc/{b.Pid}/environ");
        Assert.Contains("Permission denied", trace.Stderr, StringComparison.Ordinal);
        var secret = await As(a, "/bin/cat", config.Path);
        Assert.Contains("Permission denied", secret.Stderr, StringComparison.Ordinal);

        // The host is untouched and both plugins still run in their workers.
        var report = await new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(Requests.MissingSolvent("UID-1"), deadline: DateTime.UtcNow + CallTimeout);
        Assert.Equal("solvent-not-stated", Assert.Single(report.Findings).Code);
        Assert.Equal(RuleRunStatus.Ok, Assert.Single(report.RuleRuns, r => r.RuleId == "spectrum-metadata").Status);
        Assert.Equal(RuleRunStatus.Failed, Assert.Single(report.RuleRuns, r => r.RuleId == "fixture-throws").Status);
    }

    [Fact]
    public async Task Start_UntrustedPluginUnderRootHost_WorkerSeesTheFileSystemReadOnlyExceptItsPrivateFolder()
    {
        // A mount namespace needs root with CAP_SYS_ADMIN (CI runs so); elsewhere the host logs the gap instead.
        if (!Environment.IsPrivilegedProcess || !ReadOnlyView.Available) return;
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.ThrowingRule"]);
        var worker = Worker.Read(Assert.Single(WorkerProcesses.Running(host.PluginsPath)));
        var privateFolder = Path.GetDirectoryName(worker.Socket)!;
        var beside = Path.Combine(Path.GetTempPath(), $"ch-readonly-{Guid.NewGuid():N}");

        // /tmp is world-writable (1777): only a read-only mount stops the worker's uid writing there.
        var write = await Inside(worker, "/bin/sh", "-c", ": > \"$0/written\" && : > \"$1\"", privateFolder, beside);

        Assert.True(File.Exists(Path.Combine(privateFolder, "written")), write.Stderr);
        Assert.Contains("Read-only file system", write.Stderr, StringComparison.Ordinal);
        Assert.False(File.Exists(beside));
        var mounts = await File.ReadAllLinesAsync($"/proc/{worker.Pid}/mountinfo");
        var writable = mounts.Select(line => line.Split(' ')).Where(f => f[5].Split(',')[0] != "ro").Select(f => f[4]).ToList();
        Assert.Equal([privateFolder], writable);
    }

    /// <summary>Python's socket module connects to the Unix socket named by its first argument, and exits 0.</summary>
    private const string Connect = "import socket, sys; s = socket.socket(socket.AF_UNIX); s.connect(sys.argv[1])";

    private static string Pid(Worker worker) => worker.Pid.ToString(CultureInfo.InvariantCulture);

    /// <summary>Runs a command with the worker's credentials, as the host's setpriv gives them.</summary>
    private static Task<(int ExitCode, string Stdout, string Stderr)> As(Worker worker, params string[] command) =>
        ChildProcess.RunAsync("/usr/bin/setpriv", [$"--reuid={worker.Uid}", $"--regid={worker.Uid}", "--clear-groups", "--no-new-privs", .. command]);

    /// <summary>Runs a command with the worker's credentials inside the worker's own mount namespace.</summary>
    private static Task<(int ExitCode, string Stdout, string Stderr)> Inside(Worker worker, params string[] command) =>
        ChildProcess.RunAsync("/usr/bin/nsenter", [$"--mount=/proc/{worker.Pid}/ns/mnt", "/usr/bin/setpriv",
            $"--reuid={worker.Uid}", $"--regid={worker.Uid}", "--clear-groups", "--no-new-privs", .. command]);

    /// <summary>A running worker as /proc shows it: its uids and gids (proc(5) status lines) and the socket it serves.</summary>
    private sealed record Worker(int Pid, long[] Uids, long[] Gids, string Socket)
    {
        public long Uid => Uids[1];

        public static Worker Read(int pid)
        {
            var status = File.ReadAllLines($"/proc/{pid}/status");
            var arguments = File.ReadAllText($"/proc/{pid}/cmdline").Split('\0');
            return new Worker(pid, Ids(status, "Uid:"), Ids(status, "Gid:"), arguments[Array.IndexOf(arguments, "--socket") + 1]);
        }

        private static long[] Ids(string[] status, string field) =>
            [.. status.Single(l => l.StartsWith(field, StringComparison.Ordinal))[field.Length..]
                .Split('\t', StringSplitOptions.RemoveEmptyEntries).Select(id => long.Parse(id, CultureInfo.InvariantCulture))];
    }
}
