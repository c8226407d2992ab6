using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Probes;

/// <summary>
/// The host's start-up and readiness log lines (source-generated; stable event ids 1000–1099; the check
/// service's per-entry lines are 1100–1199 in <c>CheckLog</c>). Fields: Plugin, RuleId, Reason.
/// </summary>
internal static partial class HostLog
{
    [LoggerMessage(EventId = 1000, Level = LogLevel.Information, Message = "Engine built: {LoadedCount} rule(s) loaded, {RefusedCount} refused, profiles {Profiles}")]
    public static partial void EngineBuilt(ILogger logger, int loadedCount, int refusedCount, string profiles);

    [LoggerMessage(EventId = 1001, Level = LogLevel.Warning, Message = "Plugin {Plugin} refused (rule {RuleId}): {Reason}")]
    public static partial void PluginRefused(ILogger logger, string plugin, string ruleId, string reason);

    [LoggerMessage(EventId = 1002, Level = LogLevel.Warning, Message = "Workers of untrusted plugins share the host's network: no network namespace can be created here ({Reason})")]
    public static partial void WorkersShareNetwork(ILogger logger, string reason);

    [LoggerMessage(EventId = 1003, Level = LogLevel.Warning, Message = "Workers of untrusted plugins see the file system as their uid's permissions allow, not read-only: {Reason}")]
    public static partial void WorkersFileSystemWritable(ILogger logger, string reason);

    [LoggerMessage(EventId = 1010, Level = LogLevel.Information, Message = "Worker of plugin {Plugin} ready: {Reason}")]
    public static partial void WorkerWarmedUp(ILogger logger, string plugin, string reason);

    [LoggerMessage(EventId = 1011, Level = LogLevel.Warning, Message = "Worker of plugin {Plugin} not ready: {Reason}")]
    public static partial void WorkerNotReady(ILogger logger, string plugin, string reason);
}
