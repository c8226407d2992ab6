using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Access;

/// <summary>
/// The access checks' structured log lines (source-generated; event ids are stable, 1200–1299): remote address,
/// method or path, and the reason or the client's name — never a key or any part of one.
/// </summary>
internal static partial class AccessLog
{
    [LoggerMessage(EventId = 1200, Level = LogLevel.Warning,
        Message = "Call to {Path} from {RemoteAddress} refused: {Reason}")]
    public static partial void CallRefused(ILogger logger, string path, string remoteAddress, string reason);

    [LoggerMessage(EventId = 1201, Level = LogLevel.Debug,
        Message = "Call to {Path} from {RemoteAddress} accepted for client {Client}")]
    public static partial void CallAccepted(ILogger logger, string path, string remoteAddress, string client);
}
