using System;
using System.Collections.Generic;
using System.Linq;

namespace ConsistencyHost.Sdk.Analyzers.Banned;

/// <summary>
/// The banned-API list shared by the analyzers and the host's load-time vetting. Lines have the format of
/// BannedSymbols.txt, <c>{documentation id};{category}: {reason}</c>; <c>//</c> starts a comment line.
/// </summary>
public sealed class BannedApiList
{
    /// <summary>The manifest resource name under which both the SDK and the analyzers embed the list.</summary>
    public const string ResourceName = "ConsistencyHost.Sdk.BannedApis.txt";

    /// <summary>The category reported as nondeterminism (CHSDK2001) rather than as a banned API (CHSDK1001).</summary>
    public const string NondeterminismCategory = "nondeterminism";

    /// <summary>Every category a line may name.</summary>
    public static readonly IReadOnlyList<string> Categories = new[]
    {
        "file-system", "network", "process", "environment", "console", "reflection", "interop", "unsafe",
        "threading", NondeterminismCategory,
    };

    private BannedApiList(IReadOnlyList<BannedApiEntry> entries) => Entries = entries;

    /// <summary>The entries in file order.</summary>
    public IReadOnlyList<BannedApiEntry> Entries { get; }

    /// <summary>The list embedded in this assembly (a link to ConsistencyHost.Sdk's BannedApis.txt).</summary>
    public static BannedApiList Embedded { get; } = LoadEmbedded();

    /// <summary>Parses a list; throws <see cref="FormatException"/> naming every bad line and what was expected.</summary>
    public static BannedApiList Parse(string text)
    {
        var entries = new List<BannedApiEntry>();
        var problems = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var lines = text.Replace("\r\n", "\n").Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i].Trim();
            if (line.Length == 0 || line.StartsWith("//", StringComparison.Ordinal))
            {
                continue;
            }

            var entry = ParseLine(line, i + 1, problems);
            if (entry is not null && !seen.Add(entry.DocumentationId))
            {
                problems.Add(BannedApiListMessages.Duplicate(i + 1, entry.DocumentationId));
            }
            else if (entry is not null)
            {
                entries.Add(entry);
            }
        }

        return problems.Count == 0
            ? new BannedApiList(entries)
            : throw new FormatException(BannedApiListMessages.Malformed + string.Join("; ", problems));
    }

    private static BannedApiEntry? ParseLine(string line, int number, List<string> problems)
    {
        var semicolon = line.IndexOf(';');
        var colon = semicolon < 0 ? -1 : line.IndexOf(':', semicolon);
        if (semicolon < 0 || colon < 0)
        {
            problems.Add(BannedApiListMessages.ExpectedFormat(number, line));
            return null;
        }

        var id = line.Substring(0, semicolon).Trim();
        var category = line.Substring(semicolon + 1, colon - semicolon - 1).Trim();
        var reason = line.Substring(colon + 1).Trim();
        if (id.Length < 3 || id[1] != ':' || "NTMPFE".IndexOf(id[0]) < 0)
        {
            problems.Add(BannedApiListMessages.NotADocumentationId(number, id));
            return null;
        }

        if (!Categories.Contains(category) || reason.Length == 0)
        {
            problems.Add(BannedApiListMessages.BadCategoryOrReason(number, Categories, category, reason));
            return null;
        }

        return new BannedApiEntry(id, category, reason, number);
    }

    private static BannedApiList LoadEmbedded() => Parse(ApiListResource.Read(typeof(BannedApiList).Assembly, ResourceName));
}
