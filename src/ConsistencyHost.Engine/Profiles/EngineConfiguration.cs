using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Engine.Profiles;

/// <summary>
/// Reads <see cref="EngineOptions"/> from a configuration section (appsettings.json, environment, command
/// line). Every unknown key and bad value is collected and reported together with its full key path.
/// </summary>
/// <example>
/// <code>
/// "ConsistencyHost": {
///   "PluginsPath": "plugins", "DefaultProfile": "default", "RuleDeadlineMs": 2000,
///   "TrustedPlugins": [ "ConsistencyHost.Rules.SpectrumMetadata", "Lab.Rules" ],
///   "Profiles": { "publication": { "Rules": { "spectrum-metadata": {
///       "Options": { "RequireTemperature": "true" }, "Severities": { "solvent-not-stated": "error" } } } } }
/// }
/// </code>
/// </example>
public static class EngineConfiguration
{
    private static readonly string[] RootKeys = ["PluginsPath", "DefaultProfile", "RuleDeadlineMs", "Profiles", "TrustedPlugins", "Isolation", "ReportLimits"];
    private static readonly string[] ReportLimitKeys = ["MaxFindingsPerRule", "MaxMessageChars", "MaxReplyBytes"];
    private static readonly string[] ProfileKeys = ["Description", "OnlyListedRules", "StrictText", "Rules"];
    private static readonly string[] RuleKeys = ["Enabled", "DeadlineMs", "Options", "Severities"];

    /// <summary>Reads the options; <paramref name="defaultPluginsPath"/> applies when the section names none.</summary>
    public static EngineOptions Read(IConfigurationSection section, string defaultPluginsPath)
    {
        var problems = new List<string>();
        CheckKeys(section, RootKeys, problems);
        var options = new EngineOptions
        {
            PluginsPath = section["PluginsPath"] is { Length: > 0 } path ? path : defaultPluginsPath,
            DefaultProfile = section["DefaultProfile"] is { Length: > 0 } name ? name : Profile.DefaultName,
            RuleDeadline = ReadMilliseconds(section, "RuleDeadlineMs", problems) ?? TimeSpan.FromSeconds(2),
            Profiles = [.. section.GetSection("Profiles").GetChildren().Select(p => ReadProfile(p, problems))],
            TrustedPlugins = ReadTrusted(section.GetSection("TrustedPlugins")),
            ReportLimits = ReadReportLimits(section.GetSection("ReportLimits"), problems),
        };
        // Not thrown here: the engine lists these with the profile problems it finds against the loaded rules.
        return options with { ConfigurationProblems = problems };
    }

    /// <summary>Each limit a positive whole number; an absent one keeps its default.</summary>
    private static Running.ReportLimits ReadReportLimits(IConfigurationSection section, List<string> problems)
    {
        CheckKeys(section, ReportLimitKeys, problems);
        var defaults = Running.ReportLimits.Default;
        int Read(string key, int fallback)
        {
            if (section[key] is not { } text) return fallback;
            if (int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out var value) && value > 0) return value;
            problems.Add($"{section.Path}:{key}: {ConfiguredValue.Quote(text)} is not a positive whole number");
            return fallback;
        }

        return new Running.ReportLimits
        {
            MaxFindingsPerRule = Read("MaxFindingsPerRule", defaults.MaxFindingsPerRule),
            MaxMessageChars = Read("MaxMessageChars", defaults.MaxMessageChars),
            MaxReplyBytes = Read("MaxReplyBytes", defaults.MaxReplyBytes),
        };
    }

    /// <summary>An absent list keeps the built-in plugins trusted; a present one replaces that default.</summary>
    private static IReadOnlySet<string> ReadTrusted(IConfigurationSection section) =>
        section.Exists()
            ? section.GetChildren().Select(c => c.Value ?? "").Where(v => v.Length > 0).ToHashSet(StringComparer.Ordinal)
            : EngineOptions.BuiltInPlugins;

    private static Profile ReadProfile(IConfigurationSection section, List<string> problems)
    {
        CheckKeys(section, ProfileKeys, problems);
        return new Profile
        {
            Name = section.Key,
            Description = section["Description"] is { Length: > 0 } description ? description : null,
            OnlyListedRules = ReadBool(section, "OnlyListedRules", problems) ?? false,
            StrictText = ReadBool(section, "StrictText", problems) ?? false,
            Rules = section.GetSection("Rules").GetChildren().ToDictionary(r => r.Key, r => ReadRule(r, problems), StringComparer.Ordinal),
        };
    }

    private static RuleSettings ReadRule(IConfigurationSection section, List<string> problems)
    {
        CheckKeys(section, RuleKeys, problems);
        return new RuleSettings
        {
            Enabled = ReadBool(section, "Enabled", problems) ?? true,
            Deadline = ReadMilliseconds(section, "DeadlineMs", problems),
            Options = section.GetSection("Options").GetChildren().ToDictionary(o => o.Key, o => o.Value ?? "", StringComparer.Ordinal),
            Severities = ReadSeverities(section.GetSection("Severities"), problems),
        };
    }

    private static Dictionary<string, Severity> ReadSeverities(IConfigurationSection section, List<string> problems)
    {
        var result = new Dictionary<string, Severity>(StringComparer.Ordinal);
        foreach (var child in section.GetChildren())
        {
            if (Enum.TryParse<Severity>(child.Value, ignoreCase: true, out var severity) && Enum.IsDefined(severity))
            {
                result[child.Key] = severity;
            }
            else
            {
                problems.Add($"{child.Path}: {ConfiguredValue.Quote(child.Value)} is not a severity; expected info, warning or error");
            }
        }

        return result;
    }

    private static void CheckKeys(IConfigurationSection section, string[] known, List<string> problems)
    {
        foreach (var child in section.GetChildren().Where(c => !known.Contains(c.Key, StringComparer.OrdinalIgnoreCase)))
        {
            problems.Add($"{child.Path}: unknown key {ConfiguredValue.Quote(child.Key)}; expected one of {string.Join(", ", known)}");
        }
    }

    private static bool? ReadBool(IConfigurationSection section, string key, List<string> problems)
    {
        var text = section[key];
        if (text is null) return null;
        if (bool.TryParse(text, out var value)) return value;
        problems.Add($"{section.Path}:{key}: {ConfiguredValue.Quote(text)} is not true or false");
        return null;
    }

    private static TimeSpan? ReadMilliseconds(IConfigurationSection section, string key, List<string> problems)
    {
        var text = section[key];
        if (text is null) return null;
        if (int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var ms) && ms is > 0 and <= 600_000)
        {
            return TimeSpan.FromMilliseconds(ms);
        }

        problems.Add($"{section.Path}:{key}: {ConfiguredValue.Quote(text)} must be a whole number of milliseconds from 1 to 600000");
        return null;
    }
}
