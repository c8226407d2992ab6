using System;
using System.Collections.Generic;
using ConsistencyHost.Sdk.Analyzers.Banned;

namespace ConsistencyHost.Sdk.Analyzers.Allowed;

/// <summary>
/// The allow-list shared by the analyzers and the host's load-time vetting: the namespaces, types and members a
/// rule plugin may reference. One documentation comment id per line; <c>//</c> starts a comment line.
/// </summary>
public sealed class AllowedApiList
{
    /// <summary>The manifest resource name under which both the SDK and the analyzers embed the list.</summary>
    public const string ResourceName = "ConsistencyHost.Sdk.AllowedApis.txt";

    /// <summary>The lead of the exception message for a malformed list.</summary>
    public const string Malformed = "The allow-list is malformed: ";

    private AllowedApiList(IReadOnlyList<string> ids) => DocumentationIds = ids;

    /// <summary>The documentation ids in file order (N:, T:, M:, P:, F:, E:).</summary>
    public IReadOnlyList<string> DocumentationIds { get; }

    /// <summary>The list embedded in this assembly (a link to ConsistencyHost.Sdk's AllowedApis.txt).</summary>
    public static AllowedApiList Embedded { get; } = Parse(ApiListResource.Read(typeof(AllowedApiList).Assembly, ResourceName));

    /// <summary>Parses a list; throws <see cref="FormatException"/> naming every bad line and what was expected.</summary>
    public static AllowedApiList Parse(string text)
    {
        var ids = new List<string>();
        var problems = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var lines = text.Replace("\r\n", "\n").Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var id = lines[i].Trim();
            if (id.Length == 0 || id.StartsWith("//", StringComparison.Ordinal))
            {
                continue;
            }

            if (id.Length < 3 || id[1] != ':' || "NTMPFE".IndexOf(id[0]) < 0 || id.IndexOf(' ') >= 0)
            {
                problems.Add(BannedApiListMessages.NotADocumentationId(i + 1, id));
            }
            else if (!seen.Add(id))
            {
                problems.Add(BannedApiListMessages.Duplicate(i + 1, id));
            }
            else
            {
                ids.Add(id);
            }
        }

        return problems.Count == 0 ? new AllowedApiList(ids) : throw new FormatException(Malformed + string.Join("; ", problems));
    }
}
