using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Profiles;

/// <summary>
/// A named rule selection a group leader sets: which rules run, with which options and severities.
/// A rule the profile does not mention runs with its defaults unless <see cref="OnlyListedRules"/> is set.
/// </summary>
public sealed record Profile
{
    /// <summary>The profile every host has even when none is configured.</summary>
    public const string DefaultName = "default";

    /// <summary>The profile's name, as requests refer to it.</summary>
    public required string Name { get; init; }

    /// <summary>One line for people saying what the profile is for (shown by ListProfiles); null when none.</summary>
    public string? Description { get; init; }

    /// <summary>When true, only the rules listed in <see cref="Rules"/> (and enabled there) run.</summary>
    public bool OnlyListedRules { get; init; }

    /// <summary>
    /// True refuses an entry whose reported text holds a fragment the reader cannot understand (exit 2 /
    /// INVALID_ARGUMENT); false (the default) reports each such fragment as a <c>text-unreadable</c> warning.
    /// </summary>
    public bool StrictText { get; init; }

    /// <summary>Per-rule settings by rule id.</summary>
    public IReadOnlyDictionary<string, RuleSettings> Rules { get; init; } = new Dictionary<string, RuleSettings>();
}

/// <summary>One rule's settings within a profile.</summary>
public sealed record RuleSettings
{
    /// <summary>Whether the rule runs.</summary>
    public bool Enabled { get; init; } = true;

    /// <summary>Option overrides by option (property) name, as invariant text.</summary>
    public IReadOnlyDictionary<string, string> Options { get; init; } = new Dictionary<string, string>();

    /// <summary>Severity overrides by finding code.</summary>
    public IReadOnlyDictionary<string, Severity> Severities { get; init; } = new Dictionary<string, Severity>();

    /// <summary>The rule's deadline; null takes the engine's default.</summary>
    public TimeSpan? Deadline { get; init; }
}
