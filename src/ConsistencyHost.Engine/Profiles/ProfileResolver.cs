using ConsistencyHost.Engine.Plugins;

namespace ConsistencyHost.Engine.Profiles;

/// <summary>
/// Resolves every configured profile against the loaded rules once, at start-up. Any problem (an unknown
/// rule id, an unknown option, an option out of range) is collected; all of them are reported together.
/// </summary>
public static class ProfileResolver
{
    /// <summary>Resolves all profiles; throws <see cref="ProfileConfigurationException"/> listing every problem.</summary>
    public static IReadOnlyDictionary<string, ResolvedProfile> ResolveAll(EngineOptions options, IReadOnlyList<RuleDescriptor> rules)
    {
        var profiles = WithDefault(options);
        var problems = new List<string>(options.ConfigurationProblems);
        var resolved = new Dictionary<string, ResolvedProfile>(StringComparer.Ordinal);
        foreach (var profile in profiles)
        {
            resolved[profile.Name] = Resolve(profile, rules, options.RuleDeadline, problems);
        }

        if (!resolved.ContainsKey(options.DefaultProfile))
        {
            problems.Add($"default profile {ConfiguredValue.Quote(options.DefaultProfile)} is not defined; defined profiles: {string.Join(", ", resolved.Keys.Order(StringComparer.Ordinal))}");
        }

        return problems.Count == 0 ? resolved : throw new ProfileConfigurationException(problems);
    }

    /// <summary>The configured profiles, plus a "default" profile with every rule at its defaults when none is configured.</summary>
    public static IReadOnlyList<Profile> WithDefault(EngineOptions options) =>
        options.Profiles.Any(p => p.Name == Profile.DefaultName) ? options.Profiles : [.. options.Profiles, new Profile { Name = Profile.DefaultName }];

    private static ResolvedProfile Resolve(Profile profile, IReadOnlyList<RuleDescriptor> rules, TimeSpan deadline, List<string> problems)
    {
        var known = rules.Select(r => r.Id).ToHashSet(StringComparer.Ordinal);
        foreach (var id in profile.Rules.Keys.Where(id => !known.Contains(id)).Order(StringComparer.Ordinal))
        {
            problems.Add($"profile '{profile.Name}': unknown rule id {ConfiguredValue.Quote(id)}; loaded rules: {string.Join(", ", known.Order(StringComparer.Ordinal))}");
        }

        var active = new List<ActiveRule>();
        foreach (var rule in rules.Where(r => r.IsLoaded))
        {
            var listed = profile.Rules.TryGetValue(rule.Id, out var settings);
            settings ??= new RuleSettings();
            if (!settings.Enabled || (profile.OnlyListedRules && !listed))
            {
                continue;
            }

            problems.AddRange(UnknownCodes(rule, settings).Select(p => $"profile '{profile.Name}', rule '{rule.Id}': {p}"));
            var (bound, optionProblems) = Bind(rule, profile.Name, settings);
            problems.AddRange(optionProblems.Select(p => $"profile '{profile.Name}', rule '{rule.Id}': {p}"));
            if (bound is not null)
            {
                active.Add(new ActiveRule(rule, bound, settings.Severities, settings.Deadline ?? deadline));
            }
        }

        return new ResolvedProfile(profile.Name, active, profile.StrictText);
    }

    /// <summary>
    /// Severity overrides naming a code the rule's plugin never declares: a misspelt code would otherwise be
    /// accepted and silently never apply. A plugin that declares no codes the SDK's way cannot be checked.
    /// </summary>
    private static IEnumerable<string> UnknownCodes(RuleDescriptor rule, RuleSettings settings)
    {
        if (rule.FindingCodes.Count == 0) yield break;
        foreach (var code in settings.Severities.Keys.Order(StringComparer.Ordinal))
        {
            if (!rule.FindingCodes.Contains(code, StringComparer.Ordinal))
            {
                yield return $"severity override for unknown finding code {ConfiguredValue.Quote(code)}; the rule's codes: {string.Join(", ", rule.FindingCodes)}";
            }
        }
    }

    /// <summary>
    /// A rule loaded in the host is bound here; an untrusted rule described by a worker was bound and validated
    /// there (its options object is never created in the host), and its problems read the same.
    /// </summary>
    private static (object? Options, IReadOnlyList<string> Problems) Bind(RuleDescriptor rule, string profile, RuleSettings settings)
    {
        if (rule.WorkerBindings is null)
        {
            return OptionsBinder.Bind(rule.OptionsType!, settings.Options);
        }

        if (!rule.WorkerBindings.TryGetValue(profile, out var bound))
        {
            return (null, [$"its worker did not bind options for profile '{profile}'"]);
        }

        return bound.Problems.Count == 0 ? (bound, []) : (null, bound.Problems);
    }
}
