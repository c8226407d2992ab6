using ConsistencyHost.Engine.Reports;

namespace ConsistencyHost.Engine.Telemetry;

/// <summary>
/// Tag values as constant strings, spelled as the proto's JSON mapping spells them in a report (lower case,
/// snake case), so that a dashboard and a report use the same words and no string is built per call.
/// </summary>
public static class TelemetryValues
{
    /// <summary>The tag value of a rule-run status.</summary>
    public static string Status(RuleRunStatus status) => status switch
    {
        RuleRunStatus.Ok => "ok",
        RuleRunStatus.Failed => "failed",
        RuleRunStatus.TimedOut => "timed_out",
        RuleRunStatus.Skipped => "skipped",
        RuleRunStatus.Crashed => "crashed",
        RuleRunStatus.Quarantined => "quarantined",
        _ => "unknown",
    };

    /// <summary>The tag value of a severity.</summary>
    public static string Severity(Sdk.Findings.Severity severity) => severity switch
    {
        Sdk.Findings.Severity.Info => "info",
        Sdk.Findings.Severity.Warning => "warning",
        Sdk.Findings.Severity.Error => "error",
        _ => "unknown",
    };
}
