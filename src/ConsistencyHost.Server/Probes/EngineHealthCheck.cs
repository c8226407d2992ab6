using ConsistencyHost.Engine;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace ConsistencyHost.Server.Probes;

/// <summary>
/// The engine is built: plugins discovered and every profile resolved. The host builds it before it listens
/// (a bad profile stops start-up), so once this answers it is Healthy; it lists the profiles it serves.
/// </summary>
public sealed class EngineHealthCheck(CheckEngine engine) : IHealthCheck
{
    /// <inheritdoc />
    public Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        var data = new Dictionary<string, object>(StringComparer.Ordinal)
        {
            ["profiles"] = string.Join(", ", engine.ProfileNames),
            ["defaultProfile"] = engine.Options.DefaultProfile,
            ["rulesLoaded"] = engine.Rules.Count(r => r.IsLoaded),
        };
        return Task.FromResult(HealthCheckResult.Healthy("engine built", data));
    }
}
