using System.Net;
using Microsoft.AspNetCore.Server.Kestrel.Core;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// The two loopback endpoints the host listens on: gRPC over cleartext HTTP/2 (h2c, prior knowledge) and JSON
/// over HTTP/1.1. Two ports, because without TLS there is no ALPN: an endpoint that allows both protocols
/// treats every connection as HTTP/1.1 and refuses h2c gRPC calls with HTTP_1_1_REQUIRED (seen in our tests,
/// and as aspnetcore/grpc/troubleshoot.md describes).
/// </summary>
public sealed class ServerEndpoints
{
    private ListenOptions? _grpc;
    private ListenOptions? _http;

    /// <summary>The gRPC address, e.g. http://127.0.0.1:5151 (the bound port when 0 was asked for).</summary>
    public Uri Grpc => Address(_grpc);

    /// <summary>The JSON/HTTP address, e.g. http://127.0.0.1:5152.</summary>
    public Uri Http => Address(_http);

    internal void Configure(KestrelServerOptions kestrel, IPAddress address, ServerOptions server)
    {
        kestrel.Listen(address, server.Port, listen =>
        {
            listen.Protocols = HttpProtocols.Http2;
            _grpc = listen;
        });
        kestrel.Listen(address, server.HttpPort, listen =>
        {
            listen.Protocols = HttpProtocols.Http1;
            _http = listen;
        });
    }

    // Kestrel replaces the endpoint with the bound one once it listens, so port 0 resolves here.
    private static Uri Address(ListenOptions? listen) => listen?.IPEndPoint is { } endpoint
        ? new Uri($"http://{endpoint}")
        : throw new InvalidOperationException("the host has not been configured to listen yet");
}
