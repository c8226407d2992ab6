using System.Collections.Concurrent;
using System.Text;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Telemetry;
using ConsistencyHost.Server.Tests.Isolation;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// With the standard OTEL_EXPORTER_OTLP_ENDPOINT set, the real host exports metrics, traces and logs over OTLP
/// (HTTP/protobuf, as the OpenTelemetry protocol specification defines the /v1/metrics, /v1/traces, /v1/logs
/// paths) to a collector; here a plain HTTP receiver that keeps what it is sent.
/// </summary>
public sealed class OtlpExportTests
{
    [Fact]
    public async Task CheckEntry_OtlpEndpointSet_ExportsInstrumentsSpansAndLogs()
    {
        await using var collector = await Collector.StartAsync();
        using var config = await HostileConfig.WriteAsync($$"""
            { "OTEL_EXPORTER_OTLP_ENDPOINT": "{{collector.Address}}", "OTEL_EXPORTER_OTLP_PROTOCOL": "http/protobuf" }
            """);
        await using (var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], config.Path))
        {
            await new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(Requests.MissingSolvent("AIS-LQ-X001"), deadline: DateTime.UtcNow.AddSeconds(60));
        }

        // Stopping the host flushes every exporter. OTLP protobuf carries names and string values as UTF-8.
        Assert.Contains(TelemetryNames.RuleRuns, collector.Text("/v1/metrics"), StringComparison.Ordinal);
        Assert.Contains(TelemetryNames.Findings, collector.Text("/v1/metrics"), StringComparison.Ordinal);
        Assert.Contains(TelemetryNames.CheckActivity, collector.Text("/v1/traces"), StringComparison.Ordinal);
        Assert.Contains("AIS-LQ-X001", collector.Text("/v1/traces"), StringComparison.Ordinal);
        Assert.Contains("AIS-LQ-X001", collector.Text("/v1/logs"), StringComparison.Ordinal);
    }

    [Fact]
    public void Add_NoEndpoint_RegistersNoSdk()
    {
        var builder = WebApplication.CreateBuilder();
        builder.Configuration[Hosting.TelemetrySetup.EndpointVariable] = "";

        Assert.False(Hosting.TelemetrySetup.Add(builder));
        Assert.DoesNotContain(builder.Services, s => s.ServiceType.FullName?.StartsWith("OpenTelemetry.", StringComparison.Ordinal) == true);
    }

    private sealed class Collector : IAsyncDisposable
    {
        private readonly WebApplication _app;
        private readonly ConcurrentQueue<(string Path, byte[] Body)> _posts = new();

        private Collector(WebApplication app) => _app = app;

        public string Address => _app.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses.Single();

        public static async Task<Collector> StartAsync()
        {
            var builder = WebApplication.CreateSlimBuilder();
            builder.WebHost.UseUrls("http://127.0.0.1:0");
            var app = builder.Build();
            var collector = new Collector(app);
            app.MapPost("/{**path}", async (HttpContext context) =>
            {
                using var body = new MemoryStream();
                await context.Request.Body.CopyToAsync(body);
                collector._posts.Enqueue((context.Request.Path.Value ?? "", body.ToArray()));
                return Results.Ok();
            });
            await app.StartAsync().WaitAsync(TimeSpan.FromSeconds(60));
            return collector;
        }

        /// <summary>Everything posted to one path, bytes read as UTF-8 (protobuf framing becomes noise between the strings).</summary>
        public string Text(string path) => string.Join("\n", _posts.Where(p => p.Path == path).Select(p => Encoding.UTF8.GetString(p.Body)));

        public async ValueTask DisposeAsync()
        {
            await _app.StopAsync().WaitAsync(TimeSpan.FromSeconds(60));
            await _app.DisposeAsync();
        }
    }
}
