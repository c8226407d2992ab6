using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Running;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Diagnostics.HealthChecks;
using Microsoft.AspNetCore.Routing;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace ConsistencyHost.Server.Probes;

/// <summary>
/// Liveness and readiness, over HTTP for orchestrators (<see cref="LivePath"/>, <see cref="ReadyPath"/>, JSON body)
/// and over gRPC (grpc.health.v1: the overall service "" and consistencyhost.v1.EntryCheck both report readiness).
/// One set of checks feeds both, so a probe and a gRPC client never disagree.
/// </summary>
public static class HealthSetup
{
    /// <summary>Liveness: the process is up and serving HTTP. Not a dependency check: a restart would not fix a refused plugin.</summary>
    public const string LivePath = "/health/live";

    /// <summary>Readiness: engine built, plugins loaded or refused as data, workers ready or quarantined as data.</summary>
    public const string ReadyPath = "/health/ready";

    private const string Live = "live";
    private const string Ready = "ready";

    /// <summary>Registers the checks, the worker warm-up and the gRPC health service's mapping.</summary>
    public static void Add(IServiceCollection services, CheckEngine engine, IRuleExecutor? executor, HealthOptions options)
    {
        services.AddSingleton(options);
        services.AddSingleton(new WorkerReadiness(engine, executor, options));
        services.AddHostedService<WorkerWarmupService>();
        services.AddGrpcHealthChecks(grpc =>
            {
                grpc.Services.Clear();
                grpc.Services.Map("", check => check.Tags.Contains(Ready));
                grpc.Services.Map(EntryCheck.Descriptor.FullName, check => check.Tags.Contains(Ready));
            })
            .AddCheck("process", () => HealthCheckResult.Healthy("process up"), tags: [Live])
            .AddCheck<EngineHealthCheck>("engine", tags: [Ready])
            .AddCheck<PluginsHealthCheck>("plugins", tags: [Ready])
            .AddCheck<WorkersHealthCheck>("workers", tags: [Ready]);
    }

    /// <summary>Maps the HTTP probes and the gRPC health service.</summary>
    public static void Map(IEndpointRouteBuilder endpoints)
    {
        endpoints.MapHealthChecks(LivePath, Options(Live));
        endpoints.MapHealthChecks(ReadyPath, Options(Ready));
        endpoints.MapGrpcHealthChecksService();
    }

    // Degraded stays 200 (the replica serves, and says what is missing); Unhealthy is 503, which takes it out of rotation.
    private static HealthCheckOptions Options(string tag) => new()
    {
        Predicate = check => check.Tags.Contains(tag),
        ResponseWriter = HealthJson.WriteAsync,
        AllowCachingResponses = false,
    };
}
