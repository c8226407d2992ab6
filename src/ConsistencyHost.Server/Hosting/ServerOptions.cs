using System.Net;

namespace ConsistencyHost.Server.Hosting;

/// <summary>Transport settings, from the "Server" configuration section.</summary>
public sealed record ServerOptions
{
    /// <summary>The port the host listens on; 0 picks a free one (tests).</summary>
    public int Port { get; init; } = 5151;

    /// <summary>
    /// The port for JSON over HTTP/1.1 (the transcoded API and /openapi.json); 0 picks a free one. A second
    /// port because cleartext HTTP/1.1 and h2c cannot share one endpoint without TLS (no ALPN).
    /// </summary>
    public int HttpPort { get; init; } = 5152;

    /// <summary>The address to bind; loopback by default so nothing outside the machine can call in.</summary>
    public string BindAddress { get; init; } = IPAddress.Loopback.ToString();

    /// <summary>
    /// Largest request accepted, bytes. 4 MiB holds a molfile of thousands of atoms plus long peak lists;
    /// a larger request is RESOURCE_EXHAUSTED before it is read.
    /// </summary>
    public int MaxReceiveMessageBytes { get; init; } = 4 * 1024 * 1024;

    /// <summary>Calls checked at once (CPU-bound work: more than a few per core only adds latency).</summary>
    public int MaxConcurrentCalls { get; init; } = Math.Max(4, Environment.ProcessorCount * 4);

    /// <summary>Calls allowed to wait for a slot before new ones are refused with RESOURCE_EXHAUSTED.</summary>
    public int QueueLimit { get; init; } = 256;

    /// <summary>Largest reply sent, bytes.</summary>
    public int MaxSendMessageBytes { get; init; } = 16 * 1024 * 1024;

    /// <summary>
    /// Entries of one CheckEntries stream the host holds at once: read but not yet answered (being checked, or
    /// waiting for the client to take the reply). At the limit the host stops reading the stream, HTTP/2 flow
    /// control stops the client's writes, and a client that does not read its replies holds only this many
    /// entries (plus the transport's fixed windows) in the host. Reaching it is back-pressure, never an error.
    /// Two lets the next entry be read while one is checked; more only buffers.
    /// </summary>
    public int MaxEntriesInFlightPerStream { get; init; } = 4;

    /// <summary>
    /// Serves <c>consistencyhost.v1.Diagnostics/Echo</c> (load tests compare it with CheckEntry). Off by default:
    /// a production host has no use for it, and an endpoint that is not mapped cannot be abused.
    /// </summary>
    public bool EnableEcho { get; init; }
}
