using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;

namespace ConsistencyHost.Cli.Output;

/// <summary>One profile as it will run: every loaded rule, enabled or not, with its effective settings.</summary>
internal sealed record ProfileView(string Name, bool IsDefault, IReadOnlyList<RuleView> Rules)
{
    /// <summary>Every profile of the engine, the default one first, then by name.</summary>
    public static IReadOnlyList<ProfileView> All(CheckEngine engine) =>
    [
        .. engine.ProfileNames
            .OrderBy(name => name == engine.Options.DefaultProfile ? 0 : 1)
            .ThenBy(name => name, StringComparer.Ordinal)
            .Select(name => From(engine, engine.GetProfile(name))),
    ];

    private static ProfileView From(CheckEngine engine, ResolvedProfile profile)
    {
        var active = profile.Rules.ToDictionary(r => r.Descriptor.Id, StringComparer.Ordinal);
        var rules = engine.Rules.Where(r => r.IsLoaded).Select(rule => active.TryGetValue(rule.Id, out var run)
            ? RuleView.Enabled(run)
            : RuleView.Disabled(rule.Id, rule.Version));
        return new ProfileView(profile.Name, profile.Name == engine.Options.DefaultProfile, [.. rules]);
    }
}

/// <summary>One rule within a profile: options with their effective values (defaults included).</summary>
internal sealed record RuleView(
    string Id,
    string Version,
    bool IsEnabled,
    double? DeadlineMs,
    IReadOnlyList<KeyValuePair<string, string>> Options,
    IReadOnlyList<KeyValuePair<string, string>> Severities)
{
    public static RuleView Enabled(ActiveRule rule) => new(
        rule.Descriptor.Id,
        rule.Descriptor.Version,
        true,
        rule.Deadline.TotalMilliseconds,
        OptionValues(rule.Options),
        [.. rule.Severities.OrderBy(s => s.Key, StringComparer.Ordinal).Select(s => KeyValuePair.Create(s.Key, s.Value.ToString().ToLowerInvariant()))]);

    public static RuleView Disabled(string id, string version) => new(id, version, false, null, [], []);

    // The options object after binding holds defaults and overrides alike; its public settable properties are
    // exactly the keys a profile may set. A rule described by a worker carries the values its worker bound.
    private static IReadOnlyList<KeyValuePair<string, string>> OptionValues(object options) =>
        options is BoundOptions bound ? bound.Values : OptionText.Values(options);
}
