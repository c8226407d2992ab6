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
        var profiles = options.Profiles.ToList();
        if (!profiles.Any(p => p.Name == Profile.DefaultName))
        {
            profiles.Add(new Profile { Name = Profile.DefaultName });
        }

        var problems = new List<string>();
        var resolved = new Dictionary<string, ResolvedProfile>(StringComparer.Ordinal);
        foreach (var profile in profiles)
        {
            resolved[profile.Name] = Resolve(profile, rules, options.RuleDeadline, problems);
        }

        if (!resolved.ContainsKey(options.DefaultProfile))
        {
            problems.Add($"default profile '{options.DefaultProfile}' is not defined; defined profiles: {string.Join(", ", resolved.Keys.Order(StringComparer.Ordinal))}");
        }

        return problems.Count == 0 ? resolved : throw new ProfileConfigurationException(problems);
    }

    private static ResolvedProfile Resolve(Profile profile, IReadOnlyList<RuleDescriptor> rules, TimeSpan deadline, List<string> problems)
    {
        var known = rules.Select(r => r.Id).ToHashSet(StringComparer.Ordinal);
        foreach (var id in profile.Rules.Keys.Where(id => !known.Contains(id)).Order(StringComparer.Ordinal))
        {
            problems.Add($"profile '{profile.Name}': unknown rule id '{id}'; loaded rules: {string.Join(", ", known.Order(StringComparer.Ordinal))}");
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

            var (bound, optionProblems) = OptionsBinder.Bind(rule.OptionsType!, settings.Options);
            problems.AddRange(optionProblems.Select(p => $"profile '{profile.Name}', rule '{rule.Id}': {p}"));
            if (bound is not null)
            {
                active.Add(new ActiveRule(rule, bound, settings.Severities, settings.Deadline ?? deadline));
            }
        }

        return new ResolvedProfile(profile.Name, active);
    }
}
