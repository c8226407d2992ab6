using System.Collections.Concurrent;
using System.Diagnostics.Metrics;
using System.Net;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Telemetry;
using ConsistencyHost.Server.Probes;
using ConsistencyHost.Server.Tests.EndToEnd;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>Readiness of untrusted plugins' workers, and the supervisor's restart counter, on the real host.</summary>
public sealed class WorkerReadinessTests
{
    private const string Metadata = "ConsistencyHost.Rules.SpectrumMetadata";
    private static readonly TimeSpan WarmUpLimit = TimeSpan.FromSeconds(120);

    [Fact]
    public async Task Ready_WarmUpOff_UntrustedPluginListedAsStartingOnFirstUse()
    {
        await using var host = await RunningHost.StartAsync([Metadata, "ConsistencyHost.Fixtures.ThrowingRule"]);

        var (status, body) = await HealthEndpointTests.GetAsync(host, HealthSetup.ReadyPath);

        Assert.Equal(HttpStatusCode.OK, status);
        var workers = HealthEndpointTests.Check(body, "workers");
        Assert.Equal("Healthy", workers.GetProperty("status").GetString());
        Assert.Equal("starts on first use", workers.GetProperty("data").GetProperty("ConsistencyHost.Fixtures.ThrowingRule").GetString());
    }

    [Fact]
    public async Task Ready_WarmUpOn_WorkerListedAsAnsweredOnceReady()
    {
        using var config = await HostileConfig.WriteAsync("""{ "Server": { "Health": { "WarmUpWorkers": true } } }""");
        await using var host = await RunningHost.StartAsync([Metadata, "ConsistencyHost.Fixtures.ThrowingRule"], config.Path);

        var body = await ReadyOnceSettledAsync(host);

        var workers = HealthEndpointTests.Check(body, "workers");
        Assert.Equal("Healthy", workers.GetProperty("status").GetString());
        // The fixture throws on every entry: its worker answered with a failed run, which is a ready worker.
        Assert.StartsWith("worker started; the rule failed on an empty entry", workers.GetProperty("data").GetProperty("ConsistencyHost.Fixtures.ThrowingRule").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Ready_WorkerCrashesAtWarmUp_QuarantineListedAsDataAndDegraded()
    {
        using var config = await HostileConfig.WriteAsync("""
            { "ConsistencyHost": { "RuleDeadlineMs": 60000, "Isolation": { "CrashLimit": 1, "CrashWindowMinutes": 60 } },
              "Server": { "Health": { "WarmUpWorkers": true } } }
            """);
        await using var host = await RunningHost.StartAsync([Metadata, "ConsistencyHost.Fixtures.RecursingRule"], config.Path);

        var body = await ReadyOnceSettledAsync(host);

        Assert.Equal("Degraded", body.GetProperty("status").GetString());
        var workers = HealthEndpointTests.Check(body, "workers");
        Assert.Equal("Degraded", workers.GetProperty("status").GetString());
        Assert.StartsWith("quarantined until", workers.GetProperty("data").GetProperty("ConsistencyHost.Fixtures.RecursingRule").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task CheckEntry_WorkerCrashes_RestartCounterTaggedWithThePlugin()
    {
        var seen = new ConcurrentQueue<string>();
        using var listener = new MeterListener();
        listener.InstrumentPublished = (instrument, l) =>
        {
            if (instrument.Meter.Name == TelemetryNames.Source && instrument.Name == TelemetryNames.WorkerRestarts) l.EnableMeasurementEvents(instrument);
        };
        listener.SetMeasurementEventCallback<long>((_, value, tags, _) =>
        {
            foreach (var tag in tags) if (tag.Key == TelemetryNames.PluginTag) seen.Enqueue($"{tag.Value}={value}");
        });
        listener.Start();
        using var config = await HostileConfig.WriteAsync("""{ "ConsistencyHost": { "RuleDeadlineMs": 60000 } }""");
        await using var host = await RunningHost.StartAsync([Metadata, "ConsistencyHost.Fixtures.RecursingRule"], config.Path);

        var reply = await new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(Requests.MissingSolvent("AIS-LQ-W001"), deadline: DateTime.UtcNow + WarmUpLimit);

        Assert.Equal(RuleRunStatus.Crashed, reply.RuleRuns.Single(r => r.RuleId == "fixture-recurses").Status);
        Assert.Contains("ConsistencyHost.Fixtures.RecursingRule=1", seen);
    }

    /// <summary>Polls readiness until the warm-up has settled (no longer "starting"), within a generous bound.</summary>
    private static async Task<System.Text.Json.JsonElement> ReadyOnceSettledAsync(RunningHost host)
    {
        using var limit = new CancellationTokenSource(WarmUpLimit);
        while (true)
        {
            var (status, body) = await HealthEndpointTests.GetAsync(host, HealthSetup.ReadyPath);
            if (status == HttpStatusCode.OK) return body;
            Assert.Equal(HttpStatusCode.ServiceUnavailable, status);
            Assert.Equal("Unhealthy", HealthEndpointTests.Check(body, "workers").GetProperty("status").GetString());
            await Task.Delay(TimeSpan.FromMilliseconds(250), limit.Token);
        }
    }
}
