using ConsistencyHost.Engine;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace ConsistencyHost.Server.Probes;

/// <summary>
/// Readiness of the rule set: every discovered plugin is listed (its rules loaded, or refused with the reason).
/// A refusal is Degraded — the replica still answers with the other rules and says which are missing — unless the
/// plugin is required (<see cref="HealthOptions.RequiredPlugins"/>), which makes the replica Unhealthy.
/// </summary>
public sealed class PluginsHealthCheck(CheckEngine engine, HealthOptions options) : IHealthCheck
{
    /// <inheritdoc />
    public Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        var data = new Dictionary<string, object>(StringComparer.Ordinal);
        foreach (var rule in engine.Rules)
        {
            data[rule.Id] = rule.IsLoaded ? $"loaded from {rule.PluginName}" : $"refused ({rule.PluginName}): {rule.LoadMessage}";
        }

        var refused = engine.Rules.Where(r => !r.IsLoaded).ToList();
        var present = engine.Rules.Where(r => r.IsLoaded).Select(r => r.PluginName).ToHashSet(StringComparer.Ordinal);
        var missingRequired = options.RequiredPlugins.Where(p => !present.Contains(p)).Order(StringComparer.Ordinal).ToList();
        foreach (var plugin in missingRequired) data["required:" + plugin] = "not loaded";

        return Task.FromResult(missingRequired.Count > 0
            ? new HealthCheckResult(HealthStatus.Unhealthy, $"required plugin(s) not loaded: {string.Join(", ", missingRequired)}", data: data)
            : refused.Count > 0
                ? HealthCheckResult.Degraded($"{refused.Count} of {engine.Rules.Count} rules refused", data: data)
                : HealthCheckResult.Healthy($"{engine.Rules.Count} rules loaded", data));
    }
}
