using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Profiles;

/// <summary>
/// A rule ready to run under one profile: validated options, severity overrides, deadline. The options are the
/// rule's own options object for a rule loaded in the host, and a <see cref="Plugins.BoundOptions"/> (the JSON its
/// worker bound) for a rule described by a worker.
/// </summary>
public sealed record ActiveRule(
    RuleDescriptor Descriptor,
    object Options,
    IReadOnlyDictionary<string, Severity> Severities,
    TimeSpan Deadline);

/// <summary>A profile resolved against the loaded rules.</summary>
/// <param name="Name">The profile's name.</param>
/// <param name="Rules">Its active rules.</param>
/// <param name="StrictText">True refuses entries whose reported text has an unreadable fragment (see <see cref="Profile.StrictText"/>).</param>
public sealed record ResolvedProfile(string Name, IReadOnlyList<ActiveRule> Rules, bool StrictText = false);
