namespace ConsistencyHost.Contract.Worker;

/// <summary>
/// The start-up handshake between the host and a rule worker, after HashiCorp go-plugin's: the host writes
/// the per-launch secret as the first line of the worker's standard input (never argv or the environment,
/// which other local users can read under /proc); once it serves, the worker prints exactly one line on
/// standard output, <c>core|protocol|unix|socket-path|grpc</c>, and logs only to standard error after that.
/// </summary>
/// <remarks>The go-plugin line format is described in hashicorp/go-plugin docs/internals.md.</remarks>
public static class WorkerHandshake
{
    /// <summary>Version of the handshake itself.</summary>
    public const int CoreVersion = 1;

    /// <summary>Version of consistencyhost.worker.v1 as this build speaks it; bumped on any breaking change.</summary>
    public const int ProtocolVersion = 2;

    /// <summary>Metadata key carrying the per-launch secret on every call.</summary>
    public const string SecretHeader = "x-worker-secret";

    /// <summary>The line a worker prints once it serves on <paramref name="socketPath"/>.</summary>
    public static string Line(string socketPath) => $"{CoreVersion}|{ProtocolVersion}|unix|{socketPath}|grpc";

    /// <summary>Reads a worker's handshake line: the socket path, or why the line is unusable.</summary>
    public static (string? SocketPath, string? Problem) Parse(string? line)
    {
        if (string.IsNullOrWhiteSpace(line))
        {
            return (null, "the worker closed its standard output without a handshake line");
        }

        var parts = line.Trim().Split('|');
        if (parts.Length != 5 || parts[2] != "unix" || parts[4] != "grpc")
        {
            return (null, $"handshake line '{Shorten(line)}' is not core|protocol|unix|path|grpc");
        }

        if (parts[0] != CoreVersion.ToString(System.Globalization.CultureInfo.InvariantCulture)
            || parts[1] != ProtocolVersion.ToString(System.Globalization.CultureInfo.InvariantCulture))
        {
            return (null, $"worker speaks handshake {parts[0]} / protocol {parts[1]}; this host speaks {CoreVersion} / {ProtocolVersion} (rebuild the worker with the host)");
        }

        return (parts[3], null);
    }

    private static string Shorten(string line) => line.Length <= 120 ? line : line[..120] + "…";
}
