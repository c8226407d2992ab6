using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace ConsistencyHost.Server.Probes;

/// <summary>
/// Readiness of the worker processes of untrusted plugins, one data item per plugin. A quarantined plugin, or one
/// whose worker did not answer its warm-up, is Degraded (listed with the reason; its rules report that status per
/// entry). With warm-up on, the replica is Unhealthy — not ready — until every worker has answered or failed.
/// </summary>
public sealed class WorkersHealthCheck(WorkerReadiness readiness) : IHealthCheck
{
    /// <inheritdoc />
    public Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        if (!readiness.Isolating)
        {
            return Task.FromResult(HealthCheckResult.Healthy("isolation is off: every rule runs in the host process"));
        }

        var data = new Dictionary<string, object>(StringComparer.Ordinal);
        var (starting, degraded) = (0, 0);
        foreach (var (plugin, rule) in readiness.UntrustedPlugins)
        {
            var state = readiness.State(plugin);
            if (readiness.Quarantine(rule) is { } reason)
            {
                data[plugin] = reason;
                degraded++;
            }
            else if (!readiness.WarmsUp)
            {
                data[plugin] = state?.Description ?? "starts on first use";
            }
            else if (state is null)
            {
                data[plugin] = "starting";
                starting++;
            }
            else
            {
                data[plugin] = state.Description;
                degraded += state.Answered ? 0 : 1;
            }
        }

        var summary = $"{readiness.UntrustedPlugins.Count} untrusted plugin(s) in workers";
        return Task.FromResult(starting > 0
            ? new HealthCheckResult(HealthStatus.Unhealthy, $"{summary}; {starting} worker(s) still starting", data: data)
            : degraded > 0
                ? HealthCheckResult.Degraded($"{summary}; {degraded} quarantined or not answering", data: data)
                : HealthCheckResult.Healthy(summary, data));
    }
}
