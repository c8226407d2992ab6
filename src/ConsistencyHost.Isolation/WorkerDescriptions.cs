using ConsistencyHost.Contract.Worker.V1;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Sdk.Analyzers.Metadata;

namespace ConsistencyHost.Isolation;

/// <summary>
/// Maps the host's profiles to a Describe request and a worker's reply to the host's rule descriptors. The
/// reply comes from a process that runs untrusted code, so it is checked as input: metadata again with the
/// CHSDK0002 check, and a rule without a binding for every profile is refused.
/// </summary>
internal static class WorkerDescriptions
{
    public static DescribeRequest Request(IReadOnlyList<Profile> profiles)
    {
        var request = new DescribeRequest();
        foreach (var profile in profiles)
        {
            request.Profiles.Add(profile.Name);
            foreach (var (ruleId, settings) in profile.Rules.Where(r => r.Value.Options.Count > 0))
            {
                var overrides = new OptionOverrides { Profile = profile.Name, RuleId = ruleId };
                foreach (var (name, value) in settings.Options) overrides.Options[name] = value;
                request.Overrides.Add(overrides);
            }
        }

        return request;
    }

    public static IReadOnlyList<RuleDescriptor> Rules(DescribeResponse response, string assemblyPath, string plugin, IReadOnlyList<Profile> profiles)
    {
        if (response.Rules.Count == 0)
        {
            return [Refused(plugin, response.Refusal.Length > 0 ? response.Refusal : "the assembly contains no public rule class")];
        }

        return [.. response.Rules.Select(rule => Rule(rule, assemblyPath, plugin, profiles))];
    }

    public static RuleDescriptor Refused(string plugin, string reason, string? id = null) =>
        new() { Id = id ?? PluginDiscovery.PluginName(plugin), Plugin = plugin, LoadMessage = reason };

    private static RuleDescriptor Rule(RuleDescription rule, string assemblyPath, string plugin, IReadOnlyList<Profile> profiles)
    {
        var id = rule.Id.Length > 0 ? rule.Id : PluginDiscovery.PluginName(plugin);
        if (rule.LoadMessage.Length > 0) return Refused(plugin, rule.LoadMessage, id);
        if (RuleMetadataFormat.Problems(rule.Id, rule.Version, rule.Title) is { Count: > 0 } problems)
        {
            return Refused(plugin, $"CHSDK0002: its worker described rule '{rule.Id}': " + string.Join("; ", problems), id);
        }

        var bindings = rule.Bindings.GroupBy(b => b.Profile, StringComparer.Ordinal).ToDictionary(g => g.Key, g => Bound(g.First()), StringComparer.Ordinal);
        if (profiles.FirstOrDefault(p => !bindings.ContainsKey(p.Name)) is { } missing)
        {
            return Refused(plugin, $"its worker did not bind options of rule '{rule.Id}' for profile '{missing.Name}'", id);
        }

        return new RuleDescriptor
        {
            Id = rule.Id,
            Version = rule.Version,
            Title = rule.Title,
            Nuclei = [.. rule.Nuclei],
            Plugin = plugin,
            AssemblyPath = assemblyPath,
            OptionSchema = [.. rule.Options.Select(o => new RuleOptionInfo(o.Name, o.Type, o.DefaultValue))],
            FindingCodes = [.. rule.FindingCodes],
            WorkerBindings = bindings,
        };
    }

    private static BoundOptions Bound(BoundRuleOptions bound) => new(
        [.. bound.Problems],
        bound.OptionsJson,
        [.. bound.Values.OrderBy(v => v.Key, StringComparer.Ordinal)]);
}
