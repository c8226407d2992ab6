using System.Net;
using System.Net.NetworkInformation;
using System.Net.Sockets;
using System.Security.Cryptography.X509Certificates;
using System.Text.Json;
using ConsistencyHost.Server.Hosting;
using ConsistencyHost.Tests.Shared;
using Grpc.Core;
using Grpc.Net.Client;
using Microsoft.AspNetCore.Builder;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Tests.Access;

/// <summary>
/// The real host started with a "Server" configuration section of the test's choosing (bind address, TLS, keys,
/// client CA) from a JSON file, as an operator starts it, with every log line captured. Clients trust the test's
/// private CA only. Stopped and cleaned up on dispose.
/// </summary>
public sealed class SecuredHost : IAsyncDisposable
{
    private readonly WebApplication _app;
    private readonly PluginFolder _plugins;
    private readonly string _configFile;
    private readonly X509Certificate2? _authority;

    private SecuredHost(WebApplication app, PluginFolder plugins, string configFile, X509Certificate2? authority, CapturedLog log)
    {
        _app = app;
        _plugins = plugins;
        _configFile = configFile;
        _authority = authority;
        Log = log;
        var endpoints = ServerApp.Endpoints(app);
        Grpc = endpoints.Grpc;
        Http = endpoints.Http;
    }

    public Uri Grpc { get; }

    public Uri Http { get; }

    public CapturedLog Log { get; }

    /// <summary>
    /// An address of this machine other than loopback (the first IPv4 address of an interface that is up), or
    /// loopback when it has none: the host then runs with the same TLS and keys, through the same checks.
    /// </summary>
    public static IPAddress BindAddress { get; } = NetworkInterface.GetAllNetworkInterfaces()
        .Where(n => n.OperationalStatus == OperationalStatus.Up && n.NetworkInterfaceType != NetworkInterfaceType.Loopback)
        .SelectMany(n => n.GetIPProperties().UnicastAddresses)
        .Select(a => a.Address)
        .FirstOrDefault(a => a.AddressFamily == AddressFamily.InterNetwork && !IPAddress.IsLoopback(a)) ?? IPAddress.Loopback;

    /// <summary>Writes <paramref name="server"/> as the "Server" section and starts the host on free ports.</summary>
    public static async Task<SecuredHost> StartAsync(object server, X509Certificate2? authority)
    {
        var configFile = WriteConfig(server);
        var plugins = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var app = ServerApp.Build(new ServerLaunch { PluginsPath = plugins.Path, Port = 0, HttpPort = 0, ConfigFile = configFile });
        var log = new CapturedLog();
        app.Services.GetRequiredService<ILoggerFactory>().AddProvider(log);
        await app.StartAsync().WaitAsync(TimeSpan.FromSeconds(60));
        return new SecuredHost(app, plugins, configFile, authority, log);
    }

    /// <summary>Writes a configuration file with <paramref name="server"/> as "Server"; the access log at Debug.</summary>
    public static string WriteConfig(object server)
    {
        var path = Path.Combine(Path.GetTempPath(), "ch-access-" + Guid.NewGuid().ToString("N") + ".json");
        var logging = new Dictionary<string, object> { ["LogLevel"] = new Dictionary<string, string> { ["Default"] = "Information", ["ConsistencyHost.Server.Access"] = "Debug" } };
        File.WriteAllText(path, JsonSerializer.Serialize(new Dictionary<string, object> { ["Server"] = server, ["Logging"] = logging }));
        return path;
    }

    /// <summary>A gRPC channel presenting <paramref name="certificate"/> (if any); keys go in each call's metadata.</summary>
    public GrpcChannel Channel(X509Certificate2? certificate = null) =>
        GrpcChannel.ForAddress(Grpc, new GrpcChannelOptions { HttpHandler = Handler(certificate) });

    /// <summary>Call metadata carrying <paramref name="key"/>, as a client sends it.</summary>
    public static Metadata WithKey(string key) => new() { { "x-api-key", key } };

    /// <summary>An HTTP/1.1 client for the JSON port.</summary>
    public HttpClient JsonClient(string? key = null)
    {
        HttpMessageHandler handler = key is null ? Handler(null) : new KeyHandler(key, Handler(null));
        return new HttpClient(handler)
        {
            BaseAddress = Http,
            DefaultRequestVersion = HttpVersion.Version11,
            DefaultVersionPolicy = HttpVersionPolicy.RequestVersionExact,
            Timeout = TimeSpan.FromSeconds(60),
        };
    }

    public async ValueTask DisposeAsync()
    {
        await _app.StopAsync().WaitAsync(TimeSpan.FromSeconds(60));
        await _app.DisposeAsync();
        _plugins.Dispose();
        File.Delete(_configFile);
    }

    private SocketsHttpHandler Handler(X509Certificate2? certificate)
    {
        var handler = new SocketsHttpHandler();
        if (_authority is not null)
        {
            // Trust the test CA and nothing else; the host name check stays on.
            handler.SslOptions.CertificateChainPolicy = new X509ChainPolicy
            {
                TrustMode = X509ChainTrustMode.CustomRootTrust,
                RevocationMode = X509RevocationMode.NoCheck,
                CustomTrustStore = { _authority },
            };
        }

        if (certificate is not null) handler.SslOptions.ClientCertificates = [certificate];
        return handler;
    }

    /// <summary>Adds the x-api-key header to every request, as gRPC metadata does.</summary>
    private sealed class KeyHandler(string key, HttpMessageHandler inner) : DelegatingHandler(inner)
    {
        protected override Task<HttpResponseMessage> SendAsync(HttpRequestMessage request, CancellationToken cancellationToken)
        {
            request.Headers.Add("x-api-key", key);
            return base.SendAsync(request, cancellationToken);
        }
    }
}
