using Microsoft.Extensions.Hosting;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Probes;

/// <summary>
/// Starts every untrusted plugin's worker once the host runs, when <see cref="HealthOptions.WarmUpWorkers"/> is on.
/// Plugins warm one after another: each worker is a .NET process start, and on a small node several at once
/// would slow the host's own start-up for no gain.
/// </summary>
public sealed class WorkerWarmupService(WorkerReadiness readiness, ILogger<WorkerWarmupService> logger) : BackgroundService
{
    /// <inheritdoc />
    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        if (!readiness.WarmsUp) return;
        foreach (var plugin in readiness.UntrustedPlugins.Keys.Order(StringComparer.Ordinal))
        {
            var state = await readiness.WarmUpAsync(plugin, stoppingToken);
            if (state.Answered)
            {
                HostLog.WorkerWarmedUp(logger, plugin, state.Description);
            }
            else
            {
                HostLog.WorkerNotReady(logger, plugin, state.Description);
            }
        }
    }
}
