using System.Diagnostics;
using System.Diagnostics.Metrics;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Telemetry;

/// <summary>
/// The engine's meter, activity source and instruments (<see cref="TelemetryNames"/>). Plain System.Diagnostics:
/// nothing is exported unless a listener (an OpenTelemetry SDK, a <see cref="MeterListener"/>) subscribes, and
/// then only what it subscribes to.
/// </summary>
/// <remarks>
/// Cost per entry matters (a check takes about 200 µs): every recording first asks whether its instrument has a
/// listener, tags go through the allocation-free two-tag overloads rather than arrays, tag values are constant
/// strings, and an activity exists only when a listener samples it.
/// </remarks>
public static class EngineTelemetry
{
    /// <summary>The meter every ConsistencyHost instrument belongs to (the isolation layer adds its own instrument to it).</summary>
    public static Meter Meter { get; } = new(TelemetryNames.Source, "1.0.0");

    /// <summary>The activity source for check and rule activities.</summary>
    public static ActivitySource Source { get; } = new(TelemetryNames.Source, "1.0.0");

    // Bucket boundaries in ms for both histograms: a trusted rule takes tens of microseconds, a worker rule
    // a few milliseconds, an overrun up to the deadline (2 s by default). The SDK's defaults start at 5 ms.
    private static readonly InstrumentAdvice<double> DurationAdvice = new()
    {
        HistogramBucketBoundaries = [0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10, 25, 50, 100, 250, 500, 1000, 2500, 5000, 10000],
    };

    private static readonly Counter<long> Checks = Meter.CreateCounter<long>(TelemetryNames.Checks, "{entry}", "Entries checked");
    private static readonly Counter<long> RuleRuns = Meter.CreateCounter<long>(TelemetryNames.RuleRuns, "{run}", "Rule runs by rule and outcome");
    private static readonly Counter<long> Findings = Meter.CreateCounter<long>(TelemetryNames.Findings, "{finding}", "Findings by rule and severity");
    private static readonly Histogram<double> RuleDuration = Meter.CreateHistogram(TelemetryNames.RuleDuration, "ms", "One rule's own time on one entry", advice: DurationAdvice);
    private static readonly Histogram<double> CheckDuration = Meter.CreateHistogram(TelemetryNames.CheckDuration, "ms", "One entry from intake to report", advice: DurationAdvice);

    /// <summary>Starts the activity of one check, or returns null when nobody listens.</summary>
    /// <param name="entryId">The entry's id.</param>
    /// <param name="requestId">The id of the call that brought the entry; null or empty adds no tag (the CLI's embedded engine).</param>
    public static Activity? StartCheck(string entryId, string? requestId = null)
    {
        var activity = Source.StartActivity(TelemetryNames.CheckActivity);
        if (activity is null) return null;
        activity.SetTag(TelemetryNames.EntryIdTag, entryId);
        if (!string.IsNullOrEmpty(requestId)) activity.SetTag(TelemetryNames.RequestIdTag, requestId);
        return activity;
    }

    /// <summary>
    /// Records a finished rule run as a child of the current check activity. Called as each run's record is
    /// made, so the span ends now and starts the run's own elapsed time earlier.
    /// </summary>
    public static void RuleEnded(RuleRunRecord run)
    {
        if (!Source.HasListeners()) return;
        using var activity = Source.StartActivity(TelemetryNames.RuleActivity, ActivityKind.Internal, parentContext: default, startTime: DateTimeOffset.UtcNow - run.Elapsed);
        if (activity is null) return;
        activity.SetTag(TelemetryNames.RuleTag, run.RuleId);
        activity.SetTag(TelemetryNames.StatusTag, TelemetryValues.Status(run.Status));
        activity.SetTag(TelemetryNames.FindingCountTag, run.FindingCount);
        if (run.Status is RuleRunStatus.Failed or RuleRunStatus.TimedOut or RuleRunStatus.Crashed)
        {
            activity.SetStatus(ActivityStatusCode.Error, run.Message);
        }
    }

    /// <summary>Records a finished check: counters and histograms from the report, and closes its activity.</summary>
    public static void CheckEnded(Activity? activity, CheckReport report, TimeSpan elapsed)
    {
        if (activity is not null)
        {
            activity.SetTag(TelemetryNames.ProfileTag, report.Profile);
            activity.SetTag(TelemetryNames.FindingCountTag, report.Findings.Count);
        }

        var profile = new KeyValuePair<string, object?>(TelemetryNames.ProfileTag, report.Profile);
        if (Checks.Enabled) Checks.Add(1, profile);
        if (CheckDuration.Enabled) CheckDuration.Record(elapsed.TotalMilliseconds, profile);
        if (RuleRuns.Enabled || RuleDuration.Enabled)
        {
            foreach (var run in report.RuleRuns) RecordRun(run);
        }

        if (Findings.Enabled)
        {
            foreach (var finding in report.Findings) RecordFinding(finding);
        }
    }

    /// <summary>Marks the check's activity as refused (unusable input); the request fails, nothing is counted.</summary>
    public static void CheckRefused(Activity? activity, string field) => activity?.SetStatus(ActivityStatusCode.Error, field);

    private static void RecordRun(RuleRunRecord run)
    {
        var rule = new KeyValuePair<string, object?>(TelemetryNames.RuleTag, run.RuleId);
        RuleRuns.Add(1, rule, new KeyValuePair<string, object?>(TelemetryNames.StatusTag, TelemetryValues.Status(run.Status)));
        // A skipped or quarantined rule did not run: its zero time would only drag the latency down.
        if (run.Status is not (RuleRunStatus.Skipped or RuleRunStatus.Quarantined))
        {
            RuleDuration.Record(run.Elapsed.TotalMilliseconds, rule);
        }
    }

    private static void RecordFinding(ReportedFinding finding) =>
        Findings.Add(1,
            new KeyValuePair<string, object?>(TelemetryNames.RuleTag, finding.RuleId),
            new KeyValuePair<string, object?>(TelemetryNames.SeverityTag, TelemetryValues.Severity(finding.Finding.Severity)));
}
