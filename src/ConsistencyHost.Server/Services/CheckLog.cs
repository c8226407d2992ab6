using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// The check service's structured log lines (source-generated; event ids are stable, 1100–1199). The
/// placeholders become fields a log store can query: EntryId, RequestId (the call's x-request-id), Profile, RuleId,
/// Status, ElapsedMs.
/// </summary>
internal static partial class CheckLog
{
    [LoggerMessage(EventId = 1100, Level = LogLevel.Information,
        Message = "Checked entry {EntryId} (request {RequestId}) with profile {Profile}: {FindingCount} finding(s), highest {HighestSeverity}, {ElapsedMs:0.0} ms")]
    public static partial void EntryChecked(ILogger logger, string entryId, string requestId, string profile, int findingCount, string highestSeverity, double elapsedMs);

    [LoggerMessage(EventId = 1101, Level = LogLevel.Debug,
        Message = "Entry {EntryId}: rule {RuleId} {Status} in {ElapsedMs:0.000} ms with {FindingCount} finding(s)")]
    public static partial void RuleRan(ILogger logger, string entryId, string ruleId, string status, double elapsedMs, int findingCount);

    [LoggerMessage(EventId = 1102, Level = LogLevel.Warning,
        Message = "Entry {EntryId} (request {RequestId}): rule {RuleId} ended {Status} after {ElapsedMs:0.0} ms: {Reason}")]
    public static partial void RuleDidNotFinish(ILogger logger, string entryId, string requestId, string ruleId, string status, double elapsedMs, string reason);

    [LoggerMessage(EventId = 1103, Level = LogLevel.Information,
        Message = "Entry {EntryId} (request {RequestId}) refused: {Field}: {Reason}")]
    public static partial void EntryRefused(ILogger logger, string entryId, string requestId, string field, string reason);
}
