using System.Diagnostics;

namespace ConsistencyHost.Cli.Tests.Deployment;

/// <summary>
/// A host started as a process (the built CLI, or a published folder with the Dockerfile's ENTRYPOINT) on free
/// loopback ports, with both addresses read from its first lines. Killed on dispose.
/// </summary>
internal sealed class HostProcess : IDisposable
{
    private const string GrpcPrefix = "listening on ";
    private const string HttpPrefix = "json over http on ";
    private readonly Process _process;

    private HostProcess(Process process, Uri grpc, Uri http) => (_process, Grpc, Http) = (process, grpc, http);

    public Uri Grpc { get; }

    public Uri Http { get; }

    public static async Task<HostProcess> StartAsync(string workingDirectory, IEnumerable<string> command)
    {
        var words = command.ToList();
        var start = new ProcessStartInfo(words[0]) { RedirectStandardOutput = true, RedirectStandardError = true, WorkingDirectory = workingDirectory };
        foreach (var word in words.Skip(1)) start.ArgumentList.Add(word);
        var process = Process.Start(start)!;
        using var timeout = new CancellationTokenSource(TimeSpan.FromSeconds(60));
        try
        {
            var grpc = await ReadAddressAsync(process, GrpcPrefix, timeout.Token);
            var http = await ReadAddressAsync(process, HttpPrefix, timeout.Token);
            // Keep draining both pipes so that the host never blocks on a full pipe while logging.
            _ = process.StandardOutput.ReadToEndAsync();
            _ = process.StandardError.ReadToEndAsync();
            return new HostProcess(process, grpc, http);
        }
        catch
        {
            process.Kill(entireProcessTree: true);
            throw;
        }
    }

    public void Dispose()
    {
        _process.Kill(entireProcessTree: true);
        _process.WaitForExit(TimeSpan.FromSeconds(30));
        _process.Dispose();
    }

    private static async Task<Uri> ReadAddressAsync(Process process, string prefix, CancellationToken cancellationToken)
    {
        // The host's console log shares stdout; the address lines come once Kestrel listens.
        while (await process.StandardOutput.ReadLineAsync(cancellationToken) is { } line)
        {
            if (line.StartsWith(prefix, StringComparison.Ordinal)) return new Uri(line[prefix.Length..]);
        }

        throw new InvalidOperationException($"the host ended before printing '{prefix}': {await process.StandardError.ReadToEndAsync(cancellationToken)}");
    }
}
