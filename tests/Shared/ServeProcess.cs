using System.Diagnostics;

namespace ConsistencyHost.Tests.Shared;

/// <summary>
/// The built CLI's <c>serve</c> started as a process on free loopback ports with its built-in plugins; killed on
/// dispose. The test project must build the CLI (a project reference with ReferenceOutputAssembly="false").
/// </summary>
internal sealed class ServeProcess : IDisposable
{
    private readonly Process _process;

    private ServeProcess(Process process, Uri grpc, Uri http)
    {
        _process = process;
        Grpc = grpc;
        Http = http;
    }

    /// <summary>The gRPC address ("listening on ADDRESS").</summary>
    public Uri Grpc { get; }

    /// <summary>The JSON-over-HTTP address ("json over http on ADDRESS", printed right after).</summary>
    public Uri Http { get; }

    public bool HasExited => _process.HasExited;

    /// <summary>The host's process id (after <paramref name="launcher"/>'s exec, the host itself).</summary>
    public int ProcessId => _process.Id;

    /// <param name="extraArgs">More <c>serve</c> arguments.</param>
    /// <param name="environment">Environment variables to set for the host.</param>
    /// <param name="launcher">A command that execs the host, e.g. <c>setpriv --reuid=…</c> to run it as another user; none by default.</param>
    public static async Task<ServeProcess> StartAsync(string[]? extraArgs = null, IReadOnlyDictionary<string, string>? environment = null,
        IReadOnlyList<string>? launcher = null)
    {
        string[] command = [.. launcher ?? [], "dotnet", Path.Combine(RepoPaths.Cli, "consistencyhost.dll"), "serve", "--port", "0", "--http-port", "0", .. extraArgs ?? []];
        var start = new ProcessStartInfo(command[0]) { RedirectStandardOutput = true, RedirectStandardError = true, WorkingDirectory = RepoPaths.Cli };
        foreach (var arg in command.Skip(1))
        {
            start.ArgumentList.Add(arg);
        }

        foreach (var (name, value) in environment ?? new Dictionary<string, string>()) start.Environment[name] = value;

        var process = Process.Start(start)!;
        using var timeout = new CancellationTokenSource(TimeSpan.FromMinutes(1));
        // The host's console log shares stdout; the address lines come once Kestrel listens, gRPC first.
        var grpc = await ReadAddressAsync(process, "listening on ", timeout.Token);
        var http = await ReadAddressAsync(process, "json over http on ", timeout.Token);

        // Keep draining both pipes so that the host never blocks on a full pipe while logging.
        _ = process.StandardOutput.ReadToEndAsync();
        _ = process.StandardError.ReadToEndAsync();
        return new ServeProcess(process, grpc, http);
    }

    /// <summary>Reads stdout up to the line that starts with <paramref name="prefix"/>; the host is killed if it never comes.</summary>
    private static async Task<Uri> ReadAddressAsync(Process process, string prefix, CancellationToken cancellationToken)
    {
        var line = await process.StandardOutput.ReadLineAsync(cancellationToken);
        while (line is not null && !line.StartsWith(prefix, StringComparison.Ordinal))
        {
            line = await process.StandardOutput.ReadLineAsync(cancellationToken);
        }

        if (line is not null) return new Uri(line[prefix.Length..]);
        process.Kill(entireProcessTree: true);
        throw new InvalidOperationException($"serve ended without printing '{prefix}ADDRESS': " + await process.StandardError.ReadToEndAsync(cancellationToken));
    }

    /// <summary>Kills the host outright (SIGKILL), as a crashed node or an evicted pod would end.</summary>
    public void Kill()
    {
        _process.Kill(entireProcessTree: true);
        _process.WaitForExit(TimeSpan.FromSeconds(30));
    }

    public void Dispose()
    {
        if (!_process.HasExited) Kill();
        _process.Dispose();
    }
}
