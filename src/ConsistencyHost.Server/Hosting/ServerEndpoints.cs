using System.Net;
using ConsistencyHost.Server.Access;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Server.Kestrel.Core;
using Microsoft.AspNetCore.Server.Kestrel.Https;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// The two endpoints the host listens on: gRPC over HTTP/2 (h2c with prior knowledge on loopback, or TLS) and
/// JSON over HTTP/1.1. Two ports, because without TLS there is no ALPN: an endpoint that allows both protocols
/// treats every connection as HTTP/1.1 and refuses h2c gRPC calls with HTTP_1_1_REQUIRED (seen in our tests,
/// and as aspnetcore/grpc/troubleshoot.md describes); with TLS the layout stays the same so that clients and
/// manifests need not change.
/// </summary>
public sealed class ServerEndpoints
{
    private ListenOptions? _grpc;
    private ListenOptions? _http;
    private string _scheme = "http";

    /// <summary>The gRPC address, e.g. http://127.0.0.1:5151 or https://10.0.0.5:5151 (the bound port when 0 was asked for).</summary>
    public Uri Grpc => Address(_grpc);

    /// <summary>The JSON/HTTP address, e.g. http://127.0.0.1:5152.</summary>
    public Uri Http => Address(_http);

    internal void Configure(KestrelServerOptions kestrel, IPAddress address, ServerOptions server, AccessPolicy access)
    {
        _scheme = access.UsesTls ? "https" : "http";
        kestrel.Listen(address, server.Port, listen =>
        {
            listen.Protocols = HttpProtocols.Http2;
            UseTls(listen, access);
            _grpc = listen;
        });
        kestrel.Listen(address, server.HttpPort, listen =>
        {
            listen.Protocols = HttpProtocols.Http1;
            UseTls(listen, access);
            _http = listen;
        });
    }

    private static void UseTls(ListenOptions listen, AccessPolicy access)
    {
        if (!access.UsesTls) return;
        listen.UseHttps(new HttpsConnectionAdapterOptions
        {
            ServerCertificate = access.ServerCertificate,
            ServerCertificateChain = access.ServerChain,
            // Asked for, not required: health probes connect without one. The access gate checks the chain
            // against the configured authority per call, so a refusal is UNAUTHENTICATED with a logged reason
            // rather than a failed handshake the client cannot explain.
            ClientCertificateMode = access.RequiresClientCertificate ? ClientCertificateMode.AllowCertificate : ClientCertificateMode.NoCertificate,
            ClientCertificateValidation = (_, _, _) => true,
        });
    }

    // Kestrel replaces the endpoint with the bound one once it listens, so port 0 resolves here.
    private Uri Address(ListenOptions? listen) => listen?.IPEndPoint is { } endpoint
        ? new Uri($"{_scheme}://{endpoint}")
        : throw new InvalidOperationException("the host has not been configured to listen yet");
}
