using System.Globalization;
using System.Net;
using System.Threading.RateLimiting;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Isolation;
using ConsistencyHost.Server.Probes;
using ConsistencyHost.Server.Access;
using ConsistencyHost.Server.Services;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.Configuration.Memory;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Builds the gRPC host: generic host + Kestrel (gRPC over HTTP/2 and JSON over HTTP/1.1, each on its own port), the check service
/// with JSON transcoding, health, reflection and the OpenAPI description, behind the access gate (TLS, API keys, mTLS).
/// Access and the engine (plugins and profiles) are read before the host listens, so bad configuration stops start-up.
/// </summary>
public static class ServerApp
{
    /// <summary>The default plugin folder: "plugins" beside the executable.</summary>
    public static string DefaultPluginsPath => Path.Combine(AppContext.BaseDirectory, "plugins");

    /// <summary>The host's version (semantic version + source revision), as ListRules and <c>--version</c> report it.</summary>
    public static string Version { get; } = BuildVersion.Of(typeof(ServerApp).Assembly);

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

        var server = ReadServerOptions(builder.Configuration.GetSection("Server"));
        var address = ParseBindAddress(server.BindAddress);
        var access = AccessConfiguration.Read(builder.Configuration.GetSection("Server"), address);
        var section = builder.Configuration.GetSection("ConsistencyHost");
        var executor = IsolationConfiguration.CreateExecutor(section.GetSection("Isolation"));
        var engine = CreateEngine(section, executor);
        var endpoints = new ServerEndpoints();
        builder.WebHost.ConfigureKestrel(kestrel => endpoints.Configure(kestrel, address, server, access));

        builder.Services.AddSingleton(engine);
        builder.Services.AddSingleton(new ConcurrencyGateOptions(server.MaxConcurrentCalls, server.QueueLimit));
        builder.Services.AddSingleton(new ConcurrencyLimiter(new ConcurrencyLimiterOptions
        {
            PermitLimit = server.MaxConcurrentCalls,
            QueueLimit = server.QueueLimit,
            QueueProcessingOrder = QueueProcessingOrder.OldestFirst,
        }));
        builder.Services.AddSingleton(endpoints);
        builder.Services.AddSingleton(new StreamInFlight(server.MaxEntriesInFlightPerStream));
        builder.Services.AddGrpc(options =>
        {
            options.MaxReceiveMessageSize = server.MaxReceiveMessageBytes;
            options.MaxSendMessageSize = server.MaxSendMessageBytes;
            options.EnableDetailedErrors = false;
            options.Interceptors.Add<ConcurrencyGate>();
            options.Interceptors.Add<InputErrorInterceptor>();
        }).AddJsonTranscoding(transcoding =>
            // The transcoder writes a grpc-status-details-bin trailer as the JSON error body; the Any it holds
            // can only be written when its type is registered (otherwise the call becomes HTTP 500).
            transcoding.TypeRegistry = BadRequestStatus.DetailTypes);
        builder.Services.AddGrpcReflection();
        HealthSetup.Add(builder.Services, engine, executor, HealthOptions.Read(builder.Configuration.GetSection("Server:Health")));
        TelemetrySetup.Add(builder);

        var app = builder.Build();
        RequestIds.Use(app, endpoints);
        AccessGate.Use(app, endpoints, access);
        JsonBodyLimit.Use(app, endpoints, server.MaxReceiveMessageBytes);
        if (executor is not null)
        {
            // Every worker is killed when the host stops (and exits by itself if the host dies without stopping).
            app.Lifetime.ApplicationStopped.Register(executor.Dispose);
        }

        app.MapGrpcService<EntryCheckService>();
        if (server.EnableEcho) app.MapGrpcService<DiagnosticsService>();
        HealthSetup.Map(app);
        app.MapGrpcReflectionService();
        OpenApiDocument.Map(app);
        LogEngine(app.Services.GetRequiredService<ILoggerFactory>().CreateLogger(typeof(ServerApp)), engine, executor);
        return app;
    }

    /// <summary>
    /// The engine; with workers on it starts one per untrusted plugin to describe it, so a configuration error
    /// (which stops start-up) kills them here rather than leaving them to notice their host is gone.
    /// </summary>
    private static CheckEngine CreateEngine(IConfigurationSection section, Isolation.WorkerRuleExecutor? executor)
    {
        try
        {
            return new CheckEngine(EngineConfiguration.Read(section, DefaultPluginsPath), isolatedExecutor: executor);
        }
        catch
        {
            executor?.Dispose();
            throw;
        }
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

    /// <summary>An unreadable configuration file (permissions, ownership, missing) is an access error naming the file, not a crash.</summary>
    private static void AddConfigFile(ConfigurationManager configuration, string path)
    {
        try
        {
            configuration.AddJsonFile(path, optional: false, reloadOnChange: false);
        }
        catch (Exception error) when (error is UnauthorizedAccessException or IOException)
        {
            throw new ProfileConfigurationException([$"configuration file '{path}' could not be read: {error.Message}"],
                error is UnauthorizedAccessException ? ProfileConfigurationException.AccessTitle : ProfileConfigurationException.HostTitle);
        }
    }

    private static void AddOverrides(ConfigurationManager configuration, ServerLaunch launch)
    {
        if (launch.ConfigFile is not null)
        {
            AddConfigFile(configuration, Path.GetFullPath(launch.ConfigFile));
        }

        var overrides = new Dictionary<string, string?>();
        if (launch.PluginsPath is not null) overrides["ConsistencyHost:PluginsPath"] = Path.GetFullPath(launch.PluginsPath);
        if (launch.Port is { } port) overrides["Server:Port"] = port.ToString(CultureInfo.InvariantCulture);
        if (launch.HttpPort is { } httpPort) overrides["Server:HttpPort"] = httpPort.ToString(CultureInfo.InvariantCulture);
        if (launch.BindAddress is not null) overrides["Server:BindAddress"] = launch.BindAddress;
        if (launch.TlsCertificatePath is not null) overrides["Server:Tls:CertificatePath"] = Path.GetFullPath(launch.TlsCertificatePath);
        if (launch.TlsKeyPath is not null) overrides["Server:Tls:KeyPath"] = Path.GetFullPath(launch.TlsKeyPath);
        if (launch.ClientCertificateAuthorityPath is not null) overrides["Server:Tls:ClientCertificateAuthorityPath"] = Path.GetFullPath(launch.ClientCertificateAuthorityPath);
        if (launch.EnableEcho is { } echo) overrides["Server:EnableEcho"] = echo ? "true" : "false";
        configuration.AddInMemoryCollection(overrides);
    }

    private static ServerOptions ReadServerOptions(IConfigurationSection section)
    {
        var defaults = new ServerOptions();
        var options = new ServerOptions
        {
            Port = section.GetValue("Port", defaults.Port),
            HttpPort = section.GetValue("HttpPort", defaults.HttpPort),
            BindAddress = section.GetValue("BindAddress", defaults.BindAddress) ?? defaults.BindAddress,
            MaxReceiveMessageBytes = section.GetValue("MaxReceiveMessageBytes", defaults.MaxReceiveMessageBytes),
            MaxSendMessageBytes = section.GetValue("MaxSendMessageBytes", defaults.MaxSendMessageBytes),
            MaxConcurrentCalls = section.GetValue("MaxConcurrentCalls", defaults.MaxConcurrentCalls),
            QueueLimit = section.GetValue("QueueLimit", defaults.QueueLimit),
            MaxEntriesInFlightPerStream = section.GetValue("MaxEntriesInFlightPerStream", defaults.MaxEntriesInFlightPerStream),
            EnableEcho = section.GetValue("EnableEcho", defaults.EnableEcho),
        };
        return options.MaxEntriesInFlightPerStream >= 1
            ? options
            : throw new ProfileConfigurationException([$"Server:MaxEntriesInFlightPerStream: {options.MaxEntriesInFlightPerStream} is not allowed; expected at least 1 entry per stream"], ProfileConfigurationException.HostTitle);
    }

    // Beyond loopback, AccessConfiguration demands TLS and client authentication.
    private static IPAddress ParseBindAddress(string text) => IPAddress.TryParse(text, out var address)
        ? address
        : throw new ProfileConfigurationException([$"Server:BindAddress: {ConfiguredValue.Quote(text)} is not an IP address"], ProfileConfigurationException.HostTitle);

    private static void LogEngine(ILogger logger, CheckEngine engine, WorkerRuleExecutor? executor)
    {
        if (executor is { NetworkIsolated: false } && engine.Rules.Any(r => r.IsLoaded && !r.IsTrusted))
        {
            HostLog.WorkersShareNetwork(logger, "unshare --net failed, or Isolation:IsolateNetwork is false");
        }

        if (executor is { FileSystemReadOnly: false } && engine.Rules.Any(r => r.IsLoaded && !r.IsTrusted))
        {
            HostLog.WorkersFileSystemWritable(logger, "no mount namespace can be set up here (needs root with CAP_SYS_ADMIN), or Isolation:ReadOnlyFileSystem is false");
        }

        foreach (var rule in engine.Rules.Where(r => !r.IsLoaded))
        {
            HostLog.PluginRefused(logger, rule.PluginName, rule.Id, rule.LoadMessage);
        }

        HostLog.EngineBuilt(logger, engine.Rules.Count(r => r.IsLoaded), engine.Rules.Count(r => !r.IsLoaded), string.Join(", ", engine.ProfileNames));
    }
}
