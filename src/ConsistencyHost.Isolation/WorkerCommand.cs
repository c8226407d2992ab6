using System.Diagnostics;
using System.Globalization;

namespace ConsistencyHost.Isolation;

/// <summary>
/// The command line and environment a worker starts with: <c>prlimit</c> for resource limits, <c>unshare --net --mount</c>
/// for an empty network namespace and a read-only view of the file system (<see cref="ReadOnlyView"/>), <c>setpriv</c>
/// to drop to the worker's own unprivileged uid, then <c>dotnet</c> with the worker; an environment of only what .NET needs.
/// Each wrapper execs the next, so the worker is the host's direct child and inherits its standard input.
/// </summary>
internal static class WorkerCommand
{
    private const string Prlimit = "/usr/bin/prlimit";
    public const string Unshare = "/usr/bin/unshare";

    /// <summary>util-linux setpriv: drops to another user and sets no_new_privs before exec.</summary>
    public const string Setpriv = "/usr/bin/setpriv";

    /// <summary>A rule worker serving one plugin on a Unix socket.</summary>
    public static ProcessStartInfo Build(IsolationOptions options, int uid, string pluginAssembly, string privateDirectory, string socketPath) =>
        Build(options, uid, ["--plugin", pluginAssembly, "--socket", socketPath], privateDirectory, options.ManagedHeapBytes);

    /// <summary>
    /// The worker program with <paramref name="workerArguments"/> as <paramref name="uid"/> (from <see cref="WorkerUsers"/>:
    /// never the host's), under every limit and confinement available here.
    /// </summary>
    public static ProcessStartInfo Build(IsolationOptions options, int uid, IReadOnlyList<string> workerArguments, string privateDirectory, long managedHeapBytes)
    {
        var start = new ProcessStartInfo
        {
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
            WorkingDirectory = privateDirectory,
        };
        var command = new List<string>();
        if (File.Exists(Prlimit))
        {
            command.AddRange([Prlimit, $"--as={options.AddressSpaceBytes}", $"--nofile={options.OpenFiles}", $"--nproc={options.Processes}", "--core=0"]);
        }

        var network = options.IsolateNetwork && NetworkNamespace.Arguments is { } unshare ? unshare : [];
        var readOnly = options.ReadOnlyFileSystem && ReadOnlyView.Available;
        if (network.Length > 0 || readOnly)
        {
            command.AddRange([Unshare, .. network, .. readOnly ? ["--mount"] : Array.Empty<string>()]);
        }

        if (readOnly) command.AddRange(ReadOnlyView.Step(privateDirectory));
        command.AddRange([Setpriv, .. SwitchUser(uid)]);

        command.AddRange([DotnetMuxer.Path, options.WorkerAssemblyPath, .. workerArguments]);
        start.FileName = command[0];
        foreach (var argument in command.Skip(1)) start.ArgumentList.Add(argument);
        SetEnvironment(start, privateDirectory, managedHeapBytes);
        return start;
    }

    /// <summary>setpriv's arguments for running as <paramref name="uid"/> (and the group of that number), no supplementary groups, no way back up.</summary>
    public static string[] SwitchUser(int uid) =>
        [$"--reuid={uid}", $"--regid={uid}", "--clear-groups", "--no-new-privs"];

    /// <summary>Nothing of the host's environment (API keys, connection strings) reaches the plugin.</summary>
    private static void SetEnvironment(ProcessStartInfo start, string privateDirectory, long managedHeapBytes)
    {
        var dotnetRoot = Environment.GetEnvironmentVariable("DOTNET_ROOT");
        start.Environment.Clear();
        start.Environment["PATH"] = "/usr/bin:/bin";
        start.Environment["HOME"] = privateDirectory;
        start.Environment["TMPDIR"] = privateDirectory;
        if (!string.IsNullOrEmpty(dotnetRoot)) start.Environment["DOTNET_ROOT"] = dotnetRoot;
        start.Environment["DOTNET_GCHeapHardLimit"] = managedHeapBytes.ToString("X", CultureInfo.InvariantCulture);
        // No debugger, profiler or EventPipe endpoint: nothing else can attach to the worker through the runtime.
        start.Environment["DOTNET_EnableDiagnostics"] = "0";
        start.Environment["DOTNET_gcServer"] = "0";
        start.Environment["DOTNET_NOLOGO"] = "1";
    }
}
