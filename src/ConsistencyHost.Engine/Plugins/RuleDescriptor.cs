using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>A rule as the host knows it: metadata, where it came from, and whether it can run.</summary>
public sealed record RuleDescriptor
{
    /// <summary>Rule id from its metadata (or the plugin name when the plugin could not be read).</summary>
    public required string Id { get; init; }

    /// <summary>Rule version.</summary>
    public string Version { get; init; } = "";

    /// <summary>Rule title.</summary>
    public string Title { get; init; } = "";

    /// <summary>Nuclei the rule needs.</summary>
    public IReadOnlyList<string> Nuclei { get; init; } = [];

    /// <summary>File name of the plugin assembly.</summary>
    public required string Plugin { get; init; }

    /// <summary>True when the rule can run (in the host through <see cref="Factory"/>, or in its worker).</summary>
    public bool IsLoaded => LoadMessage.Length == 0;

    /// <summary>Why the plugin or rule was refused; empty when loaded.</summary>
    public string LoadMessage { get; init; } = "";

    /// <summary>Creates a rule instance; null when refused, and for a rule described by a worker (never loaded in the host).</summary>
    public Func<IRule>? Factory { get; init; }

    /// <summary>The rule's options type; null when refused or described by a worker.</summary>
    public Type? OptionsType { get; init; }

    /// <summary>The options a profile may set, with their defaults; empty for a refused rule.</summary>
    public IReadOnlyList<RuleOptionInfo> OptionSchema { get; init; } = [];

    /// <summary>
    /// For a rule described by a worker: its options bound and validated there, by profile name. Null for a rule
    /// loaded in the host, whose options the host binds itself.
    /// </summary>
    public IReadOnlyDictionary<string, BoundOptions>? WorkerBindings { get; init; }

    /// <summary>
    /// The finding codes the plugin declares (constants of its <c>…Codes</c> classes, as the SDK asks), so a profile's
    /// severity override naming no such code is refused at start; empty when the plugin declares none that way.
    /// </summary>
    public IReadOnlyList<string> FindingCodes { get; init; } = [];

    /// <summary>Full path of the plugin assembly (a worker loads this file); empty when refused.</summary>
    public string AssemblyPath { get; init; } = "";

    /// <summary>
    /// True when the plugin is trusted to run inside the host process (see <see cref="EngineOptions.TrustedPlugins"/>);
    /// an untrusted rule runs in a worker process whenever the engine has a worker executor.
    /// </summary>
    public bool IsTrusted { get; init; }

    /// <summary>The plugin's name: the assembly name, or the folder name of a source plugin.</summary>
    public string PluginName => PluginDiscovery.PluginName(Plugin);
}
