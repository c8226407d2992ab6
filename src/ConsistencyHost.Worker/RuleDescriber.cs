using System.Text.Json;
using ConsistencyHost.Contract.Worker.V1;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;

namespace ConsistencyHost.Worker;

/// <summary>
/// Answers the host's Describe call: every rule class of the plugin with its metadata and option schema, and
/// its options bound and validated under each of the host's profiles with the host's own binder, so that a
/// profile problem reads the same whether the rule is trusted (bound in the host) or not (bound here).
/// </summary>
internal static class RuleDescriber
{
    public static DescribeResponse Describe(LoadedPlugin plugin, DescribeRequest request)
    {
        var response = new DescribeResponse { Refusal = plugin.Refusal };
        response.RuleIds.AddRange(plugin.Rules.Keys.Order(StringComparer.Ordinal));
        foreach (var rule in plugin.All)
        {
            response.Rules.Add(Describe(rule, request));
        }

        return response;
    }

    private static RuleDescription Describe(RuleDescriptor rule, DescribeRequest request)
    {
        var description = new RuleDescription { Id = rule.Id, Version = rule.Version, Title = rule.Title, LoadMessage = rule.LoadMessage };
        description.Nuclei.AddRange(rule.Nuclei);
        description.FindingCodes.AddRange(rule.FindingCodes);
        description.Options.AddRange(rule.OptionSchema.Select(o => new OptionDescription { Name = o.Name, Type = o.Type, DefaultValue = o.Default }));
        if (!rule.IsLoaded)
        {
            return description;
        }

        foreach (var profile in request.Profiles)
        {
            var overrides = request.Overrides
                .Where(o => o.Profile == profile && o.RuleId == rule.Id)
                .SelectMany(o => o.Options)
                .ToDictionary(o => o.Key, o => o.Value, StringComparer.Ordinal);
            description.Bindings.Add(Bind(rule, profile, overrides));
        }

        return description;
    }

    private static BoundRuleOptions Bind(RuleDescriptor rule, string profile, IReadOnlyDictionary<string, string> overrides)
    {
        var bound = new BoundRuleOptions { Profile = profile };
        try
        {
            var (options, problems) = OptionsBinder.Bind(rule.OptionsType!, overrides);
            bound.Problems.AddRange(problems);
            if (options is not null)
            {
                bound.OptionsJson = JsonSerializer.Serialize(options, rule.OptionsType!);
                foreach (var (name, value) in OptionText.Values(options)) bound.Values[name] = value;
            }
        }
        catch (Exception error) when (error is not OutOfMemoryException)
        {
            // The plugin's own code (an options constructor, a property setter, Validate) threw: that is a problem
            // with the plugin's options, reported like any other, not the end of this worker.
            var cause = error is System.Reflection.TargetInvocationException { InnerException: { } inner } ? inner : error;
            bound.Problems.Add($"its options could not be bound: {cause.GetType().Name}: {cause.Message}");
        }

        return bound;
    }
}
