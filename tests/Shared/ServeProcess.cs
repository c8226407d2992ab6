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

    public static async Task<ServeProcess> StartAsync(string[]? extraArgs = null, IReadOnlyDictionary<string, string>? environment = null)
    {
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, WorkingDirectory = RepoPaths.Cli };
        foreach (var arg in new[] { Path.Combine(RepoPaths.Cli, "consistencyhost.dll"), "serve", "--port", "0", "--http-port", "0" }.Concat(extraArgs ?? []))
        {
            start.ArgumentList.Add(arg);
        }

        foreach (var (name, value) in environment ?? new Dictionary<string, string>()) start.Environment[name] = value;

        var process = Process.Start(start)!;
        using var timeout = new CancellationTokenSource(TimeSpan.FromMinutes(1));
        const string Prefix = "listening on ";
        // The host's console log shares stdout; the address line comes once Kestrel listens.
        var line = await process.StandardOutput.ReadLineAsync(timeout.Token);
        while (line is not null && !line.StartsWith(Prefix, StringComparison.Ordinal))
        {
            line = await process.StandardOutput.ReadLineAsync(timeout.Token);
        }

        if (line is null)
        {
            process.Kill(entireProcessTree: true);
            throw new InvalidOperationException("serve ended without listening: " + await process.StandardError.ReadToEndAsync(timeout.Token));
        }

        const string HttpPrefix = "json over http on ";
        var httpLine = await process.StandardOutput.ReadLineAsync(timeout.Token);
        while (httpLine is not null && !httpLine.StartsWith(HttpPrefix, StringComparison.Ordinal))
        {
            httpLine = await process.StandardOutput.ReadLineAsync(timeout.Token);
        }

        if (httpLine is null)
        {
            process.Kill(entireProcessTree: true);
            throw new InvalidOperationException("serve printed no JSON address: " + await process.StandardError.ReadToEndAsync(timeout.Token));
        }

        // Keep draining both pipes so that the host never blocks on a full pipe while logging.
        _ = process.StandardOutput.ReadToEndAsync();
        _ = process.StandardError.ReadToEndAsync();
        return new ServeProcess(process, new Uri(line[Prefix.Length..]), new Uri(httpLine[HttpPrefix.Length..]));
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
