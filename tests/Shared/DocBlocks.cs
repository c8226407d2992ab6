using System.Text.RegularExpressions;

namespace ConsistencyHost.Tests.Shared;

/// <summary>The fenced ```json blocks of a Markdown page, in order: the snippets tests hold the docs to.</summary>
internal static partial class DocBlocks
{
    /// <summary>The contents of every ```json block of <paramref name="markdown"/>.</summary>
    public static IReadOnlyList<string> Json(string markdown) => [.. JsonBlock().Matches(markdown).Select(m => m.Groups[1].Value)];

    [GeneratedRegex("```json\\n(.*?)```", RegexOptions.Singleline)]
    private static partial Regex JsonBlock();
}
