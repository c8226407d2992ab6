using System.Collections.Concurrent;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Running;

namespace ConsistencyHost.Server.Probes;

/// <summary>
/// What is known of the worker of each untrusted plugin: nothing yet (workers start on first use), or the
/// outcome of its warm-up run (<see cref="HealthOptions.WarmUpWorkers"/>). Quarantine is read live from the engine.
/// </summary>
public sealed class WorkerReadiness(CheckEngine engine, IRuleExecutor? executor, HealthOptions options)
{
    private readonly ConcurrentDictionary<string, WorkerState> _states = new(StringComparer.Ordinal);

    /// <summary>True when untrusted plugins run in workers here.</summary>
    public bool Isolating => executor is not null;

    /// <summary>True when workers are started before the replica reports ready.</summary>
    public bool WarmsUp => executor is not null && options.WarmUpWorkers;

    /// <summary>One loaded rule of each untrusted plugin, by plugin name: its worker is the plugin's.</summary>
    public IReadOnlyDictionary<string, RuleDescriptor> UntrustedPlugins { get; } = engine.Rules
        .Where(r => r.IsLoaded && !r.IsTrusted)
        .GroupBy(r => r.PluginName, StringComparer.Ordinal)
        .ToDictionary(g => g.Key, g => g.First(), StringComparer.Ordinal);

    /// <summary>The warm-up outcome of a plugin's worker; null when it has not finished (or warm-up is off).</summary>
    public WorkerState? State(string plugin) => _states.TryGetValue(plugin, out var state) ? state : null;

    /// <summary>Why the plugin is quarantined now, or null.</summary>
    public string? Quarantine(RuleDescriptor rule) => engine.HeldBackReason(rule);

    /// <summary>Runs one rule of the plugin once on an empty entry, which starts its worker, and keeps the outcome.</summary>
    public async Task<WorkerState> WarmUpAsync(string plugin, CancellationToken cancellationToken)
    {
        var descriptor = UntrustedPlugins[plugin];
        var rule = ActiveRuleOf(descriptor);
        WorkerState state;
        if (rule is null)
        {
            state = new WorkerState(false, "no profile enables its rules; its worker starts if one ever runs");
        }
        else
        {
            var result = await executor!.RunAsync(rule, new Engine.Intake.EntrySubmission { EntryId = "warm-up" }, cancellationToken);
            state = result.Status switch
            {
                Engine.Reports.RuleRunStatus.Ok => new WorkerState(true, "worker started and answered"),
                Engine.Reports.RuleRunStatus.Failed => new WorkerState(true, $"worker started; the rule failed on an empty entry: {result.Message}"),
                _ => new WorkerState(false, $"worker warm-up ended {result.Status}: {result.Message}"),
            };
        }

        _states[plugin] = state;
        return state;
    }

    private ActiveRule? ActiveRuleOf(RuleDescriptor descriptor) => engine.ProfileNames
        .SelectMany(name => engine.GetProfile(name).Rules)
        .FirstOrDefault(r => r.Descriptor.PluginName == descriptor.PluginName);
}

/// <summary>The outcome of a worker's warm-up.</summary>
/// <param name="Answered">True when the worker started and answered a run.</param>
/// <param name="Description">What happened, for the readiness body.</param>
public sealed record WorkerState(bool Answered, string Description);
