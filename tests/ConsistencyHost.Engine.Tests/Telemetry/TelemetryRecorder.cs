using System.Collections.Concurrent;
using System.Diagnostics;
using System.Diagnostics.Metrics;
using ConsistencyHost.Engine.Telemetry;

namespace ConsistencyHost.Engine.Tests.Telemetry;

/// <summary>
/// Listens to the ConsistencyHost meter and activity source the way an OpenTelemetry SDK does (a
/// <see cref="MeterListener"/> and an <see cref="ActivityListener"/>) and keeps what they saw.
/// </summary>
internal sealed class TelemetryRecorder : IDisposable
{
    private readonly MeterListener _meters = new();
    private readonly ActivityListener _activities;
    private readonly ConcurrentQueue<Measurement> _measurements = new();
    private readonly ConcurrentQueue<Activity> _stopped = new();

    public TelemetryRecorder()
    {
        _meters.InstrumentPublished = (instrument, listener) =>
        {
            if (instrument.Meter.Name == TelemetryNames.Source) listener.EnableMeasurementEvents(instrument);
        };
        _meters.SetMeasurementEventCallback<long>((instrument, value, tags, _) => Keep(instrument, value, tags));
        _meters.SetMeasurementEventCallback<double>((instrument, value, tags, _) => Keep(instrument, value, tags));
        _meters.Start();
        _activities = new ActivityListener
        {
            ShouldListenTo = source => source.Name == TelemetryNames.Source,
            Sample = (ref ActivityCreationOptions<ActivityContext> _) => ActivitySamplingResult.AllDataAndRecorded,
            ActivityStopped = _stopped.Enqueue,
        };
        ActivitySource.AddActivityListener(_activities);
    }

    public IReadOnlyList<Measurement> Measurements => [.. _measurements];

    public IReadOnlyList<Activity> Activities => [.. _stopped];

    /// <summary>Measurements of one instrument.</summary>
    public IReadOnlyList<Measurement> Of(string instrument) => [.. _measurements.Where(m => m.Instrument == instrument)];

    public void Dispose()
    {
        _meters.Dispose();
        _activities.Dispose();
    }

    private void Keep(Instrument instrument, double value, ReadOnlySpan<KeyValuePair<string, object?>> tags)
    {
        var copied = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var tag in tags) copied[tag.Key] = tag.Value?.ToString() ?? "";
        _measurements.Enqueue(new Measurement(instrument.Name, instrument.Unit, value, copied));
    }

    public sealed record Measurement(string Instrument, string? Unit, double Value, IReadOnlyDictionary<string, string> Tags);
}
