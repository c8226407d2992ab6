using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Profiles;

/// <summary>A rule ready to run under one profile: validated options, severity overrides, deadline.</summary>
public sealed record ActiveRule(
    RuleDescriptor Descriptor,
    object Options,
    IReadOnlyDictionary<string, Severity> Severities,
    TimeSpan Deadline);

/// <summary>A profile resolved against the loaded rules.</summary>
public sealed record ResolvedProfile(string Name, IReadOnlyList<ActiveRule> Rules);
