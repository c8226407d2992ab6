using ConsistencyHost.Engine.Profiles;

namespace ConsistencyHost.Engine;

/// <summary>How the engine is set up: where plugins live, the profiles, and the default deadline.</summary>
public sealed record EngineOptions
{
    /// <summary>The folder holding one sub-folder per plugin.</summary>
    public required string PluginsPath { get; init; }

    /// <summary>
    /// Where source plugins (folders of <c>.cs</c> files) are cached once compiled and vetted; null for a
    /// folder under the machine's temporary folder. Entries are keyed by a hash of the sources, the compiler,
    /// the SDK and the analyzers, so a stale entry is never reused.
    /// </summary>
    public string? SourcePluginCachePath { get; init; }

    /// <summary>The profile used when a request names none.</summary>
    public string DefaultProfile { get; init; } = Profile.DefaultName;

    /// <summary>
    /// Per-rule deadline. Two seconds is generous: the built-in rules take well under a millisecond on a
    /// typical entry, so only a runaway rule ever meets it.
    /// </summary>
    public TimeSpan RuleDeadline { get; init; } = TimeSpan.FromSeconds(2);

    /// <summary>Configured profiles; a "default" profile with every rule at its defaults is added when absent.</summary>
    public IReadOnlyList<Profile> Profiles { get; init; } = [];
}
