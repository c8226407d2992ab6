using System.Collections.Generic;
using System.Text.RegularExpressions;

namespace ConsistencyHost.Sdk.Analyzers.Metadata;

/// <summary>
/// The shape of a rule's metadata, as the host's RuleMetadataValidator checks it at load time. ASCII digits
/// only: a version must mean the same to every tool that reads it.
/// </summary>
public static class RuleMetadataFormat
{
    private static readonly Regex IdPattern = new("^[a-z][a-z0-9]*(-[a-z0-9]+)*$", RegexOptions.CultureInvariant);
    private static readonly Regex VersionPattern = new("^[0-9]+\\.[0-9]+\\.[0-9]+$", RegexOptions.CultureInvariant);

    /// <summary>Every problem with the id, version and title; empty when they are well formed.</summary>
    public static IReadOnlyList<string> Problems(string? id, string? version, string? title)
    {
        var problems = new List<string>();
        if (id is null || !IdPattern.IsMatch(id))
        {
            problems.Add($"rule id '{id}' must be lower-case words joined by hyphens, e.g. 'signal-count'");
        }

        if (version is null || !VersionPattern.IsMatch(version))
        {
            problems.Add($"rule version '{version}' must be 'major.minor.patch', e.g. '1.0.0'");
        }

        if (title is null || title.Trim().Length == 0)
        {
            problems.Add("rule title must not be empty");
        }

        return problems;
    }
}
