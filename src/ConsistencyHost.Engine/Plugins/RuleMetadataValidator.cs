using System.Text.RegularExpressions;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>Checks a rule's metadata before the host accepts it.</summary>
internal static partial class RuleMetadataValidator
{
    [GeneratedRegex("^[a-z][a-z0-9]*(-[a-z0-9]+)*$", RegexOptions.CultureInvariant)]
    private static partial Regex IdPattern();

    [GeneratedRegex(@"^\d+\.\d+\.\d+$", RegexOptions.CultureInvariant)]
    private static partial Regex VersionPattern();

    /// <summary>Returns every problem with the metadata; empty when it is well formed.</summary>
    public static IReadOnlyList<string> Problems(RuleAttribute metadata)
    {
        var problems = new List<string>();
        if (!IdPattern().IsMatch(metadata.Id ?? ""))
        {
            problems.Add($"rule id '{metadata.Id}' must be lower-case words joined by hyphens, e.g. 'signal-count'");
        }

        if (!VersionPattern().IsMatch(metadata.Version ?? ""))
        {
            problems.Add($"rule version '{metadata.Version}' must be 'major.minor.patch', e.g. '1.0.0'");
        }

        if (string.IsNullOrWhiteSpace(metadata.Title))
        {
            problems.Add("rule title must not be empty");
        }

        return problems;
    }
}
