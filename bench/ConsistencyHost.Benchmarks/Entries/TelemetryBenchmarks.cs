using System.Diagnostics;
using System.Diagnostics.Metrics;
using BenchmarkDotNet.Attributes;
using ConsistencyHost.Engine.Telemetry;

namespace ConsistencyHost.Benchmarks.Entries;

/// <summary>
/// What observing the engine costs per entry: the mix checked with nobody listening (the host without
/// OTEL_EXPORTER_OTLP_ENDPOINT) against the same with a meter listener taking every measurement and an activity
/// listener recording every check and rule activity (roughly what an OpenTelemetry SDK attaches). Compare the
/// ratio, not the times.
/// </summary>
[BenchmarkCategory("telemetry")]
public class TelemetryBenchmarks
{
    private EntryFixture _fixture = null!;
    private MeterListener? _meters;
    private ActivityListener? _activities;
    private long _measurements;

    [Params(false, true)]
    public bool Observed { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _fixture = EntryFixture.Create();
        if (!Observed) return;
        _meters = new MeterListener
        {
            InstrumentPublished = (instrument, listener) =>
            {
                if (instrument.Meter.Name == TelemetryNames.Source) listener.EnableMeasurementEvents(instrument);
            },
        };
        _meters.SetMeasurementEventCallback<long>((_, value, _, _) => Interlocked.Add(ref _measurements, value));
        _meters.SetMeasurementEventCallback<double>((_, _, _, _) => Interlocked.Increment(ref _measurements));
        _meters.Start();
        _activities = new ActivityListener
        {
            ShouldListenTo = source => source.Name == TelemetryNames.Source,
            Sample = (ref ActivityCreationOptions<ActivityContext> _) => ActivitySamplingResult.AllDataAndRecorded,
        };
        ActivitySource.AddActivityListener(_activities);
    }

    [GlobalCleanup]
    public void Cleanup()
    {
        _meters?.Dispose();
        _activities?.Dispose();
    }

    /// <summary>The embedded engine end to end over the mix, per entry.</summary>
    [Benchmark(OperationsPerInvoke = EntryMix.Count)]
    public int Check()
    {
        var findings = 0;
        foreach (var submission in EntryMix.All) findings += _fixture.Engine.Check(submission).Findings.Count;
        return findings;
    }
}
