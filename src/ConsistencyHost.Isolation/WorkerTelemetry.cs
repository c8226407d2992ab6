using System.Diagnostics.Metrics;
using ConsistencyHost.Engine.Telemetry;

namespace ConsistencyHost.Isolation;

/// <summary>
/// The worker supervisor's instrument, on the engine's meter: <c>consistencyhost.worker.restarts</c>, one per
/// worker lost (a crash, an overrun kill, a broken call), after which the plugin's next run starts a new one
/// unless the plugin is quarantined. Tagged with the plugin's assembly name, never its path (paths differ per
/// replica and per temporary folder).
/// </summary>
internal static class WorkerTelemetry
{
    private static readonly Counter<long> Restarts =
        EngineTelemetry.Meter.CreateCounter<long>(TelemetryNames.WorkerRestarts, "{restart}", "Worker processes lost and restarted on next use, by plugin");

    public static void Restarted(string pluginAssembly)
    {
        if (Restarts.Enabled)
        {
            Restarts.Add(1, new KeyValuePair<string, object?>(TelemetryNames.PluginTag, Path.GetFileNameWithoutExtension(pluginAssembly)));
        }
    }
}
