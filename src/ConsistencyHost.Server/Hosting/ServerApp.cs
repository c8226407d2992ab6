using System.Globalization;
using System.Net;
using System.Threading.RateLimiting;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Server.Services;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.Configuration.Memory;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Builds the gRPC host: generic host + Kestrel (gRPC over h2c and JSON over HTTP/1.1, each on its own loopback port), the check service
/// with JSON transcoding, health, reflection and the OpenAPI description.
/// The engine (plugins and profiles) is built before the host listens, so a bad profile stops start-up.
/// </summary>
public static class ServerApp
{
    /// <summary>The default plugin folder: "plugins" beside the executable.</summary>
    public static string DefaultPluginsPath => Path.Combine(AppContext.BaseDirectory, "plugins");

    /// <summary>Builds the application; throws <see cref="ProfileConfigurationException"/> on bad configuration.</summary>
    public static WebApplication Build(ServerLaunch launch)
    {
        var builder = WebApplication.CreateBuilder(new WebApplicationOptions
        {
            Args = [.. launch.Args],
            ContentRootPath = AppContext.BaseDirectory,
        });
        AddDefaults(builder.Configuration);
        AddOverrides(builder.Configuration, launch);

        var section = builder.Configuration.GetSection("ConsistencyHost");
        var executor = IsolationConfiguration.CreateExecutor(section.GetSection("Isolation"));
        var engine = new CheckEngine(EngineConfiguration.Read(section, DefaultPluginsPath), isolatedExecutor: executor);
        var server = ReadServerOptions(builder.Configuration.GetSection("Server"));
        var endpoints = new ServerEndpoints();
        ConfigureKestrel(builder.WebHost, server, endpoints);

        builder.Services.AddSingleton(engine);
        builder.Services.AddSingleton(new ConcurrencyGateOptions(server.MaxConcurrentCalls, server.QueueLimit));
        builder.Services.AddSingleton(new ConcurrencyLimiter(new ConcurrencyLimiterOptions
        {
            PermitLimit = server.MaxConcurrentCalls,
            QueueLimit = server.QueueLimit,
            QueueProcessingOrder = QueueProcessingOrder.OldestFirst,
        }));
        builder.Services.AddSingleton(endpoints);
        builder.Services.AddGrpc(options =>
        {
            options.MaxReceiveMessageSize = server.MaxReceiveMessageBytes;
            options.MaxSendMessageSize = server.MaxSendMessageBytes;
            options.EnableDetailedErrors = false;
            options.Interceptors.Add<ConcurrencyGate>();
            options.Interceptors.Add<InputErrorInterceptor>();
        }).AddJsonTranscoding();
        builder.Services.AddGrpcReflection();
        builder.Services.AddGrpcHealthChecks().AddCheck("plugins", () => PluginHealth(engine));

        var app = builder.Build();
        JsonBodyLimit.Use(app, endpoints, server.MaxReceiveMessageBytes);
        if (executor is not null)
        {
            // Every worker is killed when the host stops (and exits by itself if the host dies without stopping).
            app.Lifetime.ApplicationStopped.Register(executor.Dispose);
        }

        app.MapGrpcService<EntryCheckService>();
        if (server.EnableEcho) app.MapGrpcService<DiagnosticsService>();
        app.MapGrpcHealthChecksService();
        app.MapGrpcReflectionService();
        OpenApiDocument.Map(app);
        return app;
    }

    /// <summary>The addresses the started host actually listens on (resolves port 0): gRPC first, then JSON/HTTP.</summary>
    public static IReadOnlyList<string> ListeningAddresses(WebApplication app) =>
        [Endpoints(app).Grpc.ToString().TrimEnd('/'), Endpoints(app).Http.ToString().TrimEnd('/')];

    /// <summary>The started host's endpoints.</summary>
    public static ServerEndpoints Endpoints(WebApplication app) => app.Services.GetRequiredService<ServerEndpoints>();

    /// <summary>
    /// Defaults below every other configuration source (so any of them overrides): ASP.NET Core's per-request
    /// lines at Warning, as the ASP.NET Core project template's appsettings.json sets them. At Information they
    /// are four entries per call (request start and end, endpoint start and end): 140,000 console lines for 17,000
    /// calls in a 10-second load test, work a production host does not want on every call.
    /// </summary>
    private static void AddDefaults(ConfigurationManager configuration) =>
        configuration.Sources.Insert(0, new MemoryConfigurationSource
        {
            InitialData = [new("Logging:LogLevel:Microsoft.AspNetCore", "Warning")],
        });

    private static void AddOverrides(ConfigurationManager configuration, ServerLaunch launch)
    {
        if (launch.ConfigFile is not null)
        {
            configuration.AddJsonFile(Path.GetFullPath(launch.ConfigFile), optional: false, reloadOnChange: false);
        }

        var overrides = new Dictionary<string, string?>();
        if (launch.PluginsPath is not null) overrides["ConsistencyHost:PluginsPath"] = Path.GetFullPath(launch.PluginsPath);
        if (launch.Port is { } port) overrides["Server:Port"] = port.ToString(CultureInfo.InvariantCulture);
        if (launch.HttpPort is { } httpPort) overrides["Server:HttpPort"] = httpPort.ToString(CultureInfo.InvariantCulture);
        if (launch.EnableEcho is { } echo) overrides["Server:EnableEcho"] = echo ? "true" : "false";
        configuration.AddInMemoryCollection(overrides);
    }

    private static ServerOptions ReadServerOptions(IConfigurationSection section)
    {
        var defaults = new ServerOptions();
        return new ServerOptions
        {
            Port = section.GetValue("Port", defaults.Port),
            HttpPort = section.GetValue("HttpPort", defaults.HttpPort),
            BindAddress = section.GetValue("BindAddress", defaults.BindAddress) ?? defaults.BindAddress,
            MaxReceiveMessageBytes = section.GetValue("MaxReceiveMessageBytes", defaults.MaxReceiveMessageBytes),
            MaxSendMessageBytes = section.GetValue("MaxSendMessageBytes", defaults.MaxSendMessageBytes),
            MaxConcurrentCalls = section.GetValue("MaxConcurrentCalls", defaults.MaxConcurrentCalls),
            QueueLimit = section.GetValue("QueueLimit", defaults.QueueLimit),
            EnableEcho = section.GetValue("EnableEcho", defaults.EnableEcho),
        };
    }

    private static void ConfigureKestrel(IWebHostBuilder webHost, ServerOptions server, ServerEndpoints endpoints)
    {
        if (!IPAddress.TryParse(server.BindAddress, out var address))
        {
            throw new ProfileConfigurationException([$"Server:BindAddress: '{server.BindAddress}' is not an IP address"]);
        }

        if (!IPAddress.IsLoopback(address))
        {
            // Beyond loopback the host needs TLS and client authentication, which this version does not
            // configure yet; refusing is safer than serving unauthenticated on a network.
            throw new ProfileConfigurationException([$"Server:BindAddress: '{server.BindAddress}' is not a loopback address; this version serves on loopback only"]);
        }

        webHost.ConfigureKestrel(kestrel =>
        {
            endpoints.Configure(kestrel, address, server);
        });
    }

    private static HealthCheckResult PluginHealth(CheckEngine engine)
    {
        var refused = engine.Rules.Count(r => !r.IsLoaded);
        return refused == 0
            ? HealthCheckResult.Healthy($"{engine.Rules.Count} rules loaded")
            : HealthCheckResult.Degraded($"{refused} of {engine.Rules.Count} rules refused");
    }
}
