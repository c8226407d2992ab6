using ConsistencyHost.Engine.Profiles;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Server.Probes;

/// <summary>What readiness demands, from the "Server:Health" configuration section.</summary>
/// <example><code>"Server": { "Health": { "RequiredPlugins": [ "ConsistencyHost.Rules.MassFormula" ], "WarmUpWorkers": true } }</code></example>
public sealed record HealthOptions
{
    private static readonly string[] Keys = ["RequiredPlugins", "WarmUpWorkers"];

    /// <summary>
    /// Plugins (assembly or source-folder names) without which the replica must not take traffic: one refused
    /// or missing makes readiness Unhealthy (HTTP 503, gRPC NOT_SERVING). Any other refusal is Degraded.
    /// </summary>
    public IReadOnlySet<string> RequiredPlugins { get; init; } = new HashSet<string>(StringComparer.Ordinal);

    /// <summary>
    /// Start every untrusted plugin's worker at start-up (one run of one of its rules on an empty entry) and stay
    /// not-ready until each has answered, so that no caller pays a worker's cold start. Off by default: workers
    /// then start on a rule's first use.
    /// </summary>
    public bool WarmUpWorkers { get; init; }

    /// <summary>Reads the section; throws <see cref="ProfileConfigurationException"/> naming each bad key.</summary>
    public static HealthOptions Read(IConfigurationSection section)
    {
        var problems = section.GetChildren()
            .Where(child => !Keys.Contains(child.Key, StringComparer.OrdinalIgnoreCase))
            .Select(child => $"{child.Path}: unknown key {ConfiguredValue.Quote(child.Key)}; expected one of {string.Join(", ", Keys)}")
            .ToList();
        var warmUp = false;
        if (section["WarmUpWorkers"] is { } text && !bool.TryParse(text, out warmUp))
        {
            problems.Add($"{section.Path}:WarmUpWorkers: {ConfiguredValue.Quote(text)} is not true or false");
        }

        if (problems.Count > 0) throw new ProfileConfigurationException(problems, ProfileConfigurationException.HostTitle);
        return new HealthOptions
        {
            RequiredPlugins = section.GetSection("RequiredPlugins").GetChildren()
                .Select(c => c.Value ?? "").Where(v => v.Length > 0).ToHashSet(StringComparer.Ordinal),
            WarmUpWorkers = warmUp,
        };
    }
}
