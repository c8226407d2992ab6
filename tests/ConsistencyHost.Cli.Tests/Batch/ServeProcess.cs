using System.Diagnostics;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>The CLI's <c>serve</c> started as a process on free loopback ports; killed on dispose.</summary>
internal sealed class ServeProcess : IDisposable
{
    private readonly Process _process;

    private ServeProcess(Process process, Uri grpc)
    {
        _process = process;
        Grpc = grpc;
    }

    public Uri Grpc { get; }

    public static async Task<ServeProcess> StartAsync(string[]? extraArgs = null, IReadOnlyDictionary<string, string>? environment = null)
    {
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, WorkingDirectory = CliProcess.Directory };
        foreach (var arg in new[] { Path.Combine(CliProcess.Directory, "consistencyhost.dll"), "serve", "--port", "0", "--http-port", "0" }.Concat(extraArgs ?? []))
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

        // Keep draining both pipes so that the host never blocks on a full pipe while logging.
        _ = process.StandardOutput.ReadToEndAsync();
        _ = process.StandardError.ReadToEndAsync();
        return new ServeProcess(process, new Uri(line[Prefix.Length..]));
    }

    public void Dispose()
    {
        _process.Kill(entireProcessTree: true);
        _process.WaitForExit(TimeSpan.FromSeconds(30));
        _process.Dispose();
    }
}
