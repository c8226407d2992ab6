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

    /// <summary>
    /// Names of the plugins (assembly names, without ".dll") trusted to run inside the host process; every
    /// other plugin, and every source plugin, is untrusted and runs in a worker process when the engine has a
    /// worker executor. The default is the rule plugins shipped with the host (<see cref="BuiltInPlugins"/>).
    /// </summary>
    /// <remarks>
    /// Trust goes by name because whoever controls the plugin folder controls which files carry those names;
    /// a lab that wants its own plugin in-process lists it here and accepts that it can take the host down.
    /// </remarks>
    public IReadOnlySet<string> TrustedPlugins { get; init; } = BuiltInPlugins;

    /// <summary>The rule plugins built and shipped with the host.</summary>
    public static IReadOnlySet<string> BuiltInPlugins { get; } = new HashSet<string>(StringComparer.Ordinal)
    {
        "ConsistencyHost.Rules.CouplingPartners",
        "ConsistencyHost.Rules.IntegralRatio",
        "ConsistencyHost.Rules.MassFormula",
        "ConsistencyHost.Rules.SignalCount",
        "ConsistencyHost.Rules.ShiftPlausibility",
        "ConsistencyHost.Rules.SolventResidual",
        "ConsistencyHost.Rules.SpectrumMetadata",
    };

    /// <summary>Configured profiles; a "default" profile with every rule at its defaults is added when absent.</summary>
    public IReadOnlyList<Profile> Profiles { get; init; } = [];

    /// <summary>
    /// Problems found while reading the configuration (a misspelt key, a bad value); the engine reports them at
    /// start together with the problems found against the loaded rules, so a group leader sees every one at once.
    /// </summary>
    public IReadOnlyList<string> ConfigurationProblems { get; init; } = [];

    /// <summary>How many findings and characters one rule may report (configuration section <c>ReportLimits</c>).</summary>
    public Running.ReportLimits ReportLimits { get; init; } = Running.ReportLimits.Default;
}
