namespace ConsistencyHost.Engine.Telemetry;

/// <summary>
/// The names under which the host reports metrics and traces: one <see cref="System.Diagnostics.Metrics.Meter"/>
/// and one <see cref="System.Diagnostics.ActivitySource"/>, both called <see cref="Source"/>, and their
/// instruments and tags. docs/deployment.md lists them; a test holds that table to these constants. Names follow
/// the OpenTelemetry semantic-convention style (dotted, lower case, units outside the name).
/// </summary>
public static class TelemetryNames
{
    /// <summary>The meter's and the activity source's name; an OpenTelemetry SDK subscribes to it.</summary>
    public const string Source = "ConsistencyHost";

    /// <summary>Counter: entries checked (tag <see cref="ProfileTag"/>).</summary>
    public const string Checks = "consistencyhost.checks";

    /// <summary>Counter: rule runs (tags <see cref="RuleTag"/>, <see cref="StatusTag"/>).</summary>
    public const string RuleRuns = "consistencyhost.rule.runs";

    /// <summary>Counter: findings reported (tags <see cref="RuleTag"/>, <see cref="SeverityTag"/>).</summary>
    public const string Findings = "consistencyhost.findings";

    /// <summary>Histogram, ms: one rule's own time on one entry (tag <see cref="RuleTag"/>).</summary>
    public const string RuleDuration = "consistencyhost.rule.duration";

    /// <summary>Histogram, ms: one entry from intake to report (tag <see cref="ProfileTag"/>).</summary>
    public const string CheckDuration = "consistencyhost.check.duration";

    /// <summary>Counter: worker processes lost and to be restarted (tag <see cref="PluginTag"/>).</summary>
    public const string WorkerRestarts = "consistencyhost.worker.restarts";

    /// <summary>Activity for one entry; its children are <see cref="RuleActivity"/>.</summary>
    public const string CheckActivity = "consistencyhost.check";

    /// <summary>Activity for one rule run inside a check.</summary>
    public const string RuleActivity = "consistencyhost.rule";

    /// <summary>Tag: the profile applied.</summary>
    public const string ProfileTag = "profile";

    /// <summary>Tag: the rule id.</summary>
    public const string RuleTag = "rule";

    /// <summary>Tag: how a rule run ended (ok, failed, timed_out, skipped, crashed, quarantined).</summary>
    public const string StatusTag = "status";

    /// <summary>Tag: a finding's severity (info, warning, error).</summary>
    public const string SeverityTag = "severity";

    /// <summary>Tag: a plugin's assembly name.</summary>
    public const string PluginTag = "plugin";

    /// <summary>Activity tag: the entry id (traces only: ids are unbounded, so never a metric tag).</summary>
    public const string EntryIdTag = "consistencyhost.entry_id";

    /// <summary>Activity tag: the request id of the call that brought the entry (x-request-id; traces only, as above).</summary>
    public const string RequestIdTag = "consistencyhost.request_id";

    /// <summary>Activity tag: findings a rule or a check produced.</summary>
    public const string FindingCountTag = "consistencyhost.finding_count";
}
