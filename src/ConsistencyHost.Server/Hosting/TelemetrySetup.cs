using ConsistencyHost.Engine.Telemetry;
using Microsoft.AspNetCore.Builder;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using OpenTelemetry;
using OpenTelemetry.Logs;
using OpenTelemetry.Metrics;
using OpenTelemetry.Resources;
using OpenTelemetry.Trace;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Wires the OpenTelemetry SDK to the engine's meter and activity source (<see cref="TelemetryNames.Source"/>),
/// ASP.NET Core's request metrics and traces, and the structured logs, exporting all three over OTLP — only when
/// the standard variable <c>OTEL_EXPORTER_OTLP_ENDPOINT</c> is set (environment or configuration). Otherwise no SDK
/// is registered, nothing listens, and the instruments cost one flag test each.
/// </summary>
/// <remarks>
/// The exporter reads the other standard variables itself (OTEL_EXPORTER_OTLP_PROTOCOL, _HEADERS,
/// OTEL_METRIC_EXPORT_INTERVAL, OTEL_SERVICE_NAME, OTEL_RESOURCE_ATTRIBUTES …), from the same configuration.
/// </remarks>
public static class TelemetrySetup
{
    /// <summary>The standard variable that turns export on.</summary>
    public const string EndpointVariable = "OTEL_EXPORTER_OTLP_ENDPOINT";

    /// <summary>The service name reported when OTEL_SERVICE_NAME does not set one.</summary>
    public const string ServiceName = "consistencyhost";

    /// <summary>True when export was turned on.</summary>
    public static bool Add(WebApplicationBuilder builder)
    {
        if (string.IsNullOrWhiteSpace(builder.Configuration[EndpointVariable])) return false;
        builder.Logging.AddOpenTelemetry(logs =>
        {
            logs.IncludeFormattedMessage = true;
            logs.IncludeScopes = true;
        });
        builder.Services.AddOpenTelemetry()
            .ConfigureResource(resource => resource.AddService(ServiceName))
            .WithMetrics(metrics => metrics.AddMeter(TelemetryNames.Source).AddAspNetCoreInstrumentation())
            .WithTracing(tracing => tracing
                .AddSource(TelemetryNames.Source)
                // Probes arrive every few seconds from every kubelet; their spans would drown the checks.
                .AddAspNetCoreInstrumentation(aspnet => aspnet.Filter = context => !context.Request.Path.StartsWithSegments("/health")))
            .UseOtlpExporter();
        return true;
    }
}
