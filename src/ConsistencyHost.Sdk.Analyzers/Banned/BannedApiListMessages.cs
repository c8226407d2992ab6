using System.Collections.Generic;

namespace ConsistencyHost.Sdk.Analyzers.Banned;

/// <summary>Every message the banned-list parser produces, in one place; tests build their expectations from these.</summary>
public static class BannedApiListMessages
{
    /// <summary>The lead of the exception message, followed by every problem.</summary>
    public const string Malformed = "The banned-API list is malformed: ";

    /// <summary>A line without the ';' and ':' separators.</summary>
    public static string ExpectedFormat(int line, string text) =>
        $"line {line}: expected '{{id}};{{category}}: {{reason}}' but got '{text}'";

    /// <summary>The part before ';' is not a documentation comment id.</summary>
    public static string NotADocumentationId(int line, string id) =>
        $"line {line}: '{id}' is not a documentation id (expected N:, T:, M:, P:, F: or E: and a name)";

    /// <summary>An unknown category or an empty reason.</summary>
    public static string BadCategoryOrReason(int line, IEnumerable<string> categories, string category, string reason) =>
        $"line {line}: expected a category ({string.Join(", ", categories)}) and a reason, got '{category}: {reason}'";

    /// <summary>The same id on two lines.</summary>
    public static string Duplicate(int line, string id) => $"line {line}: '{id}' is listed twice";
}
