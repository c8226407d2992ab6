namespace ConsistencyHost.Sdk.Analyzers.Banned;

/// <summary>One line of the banned-API list.</summary>
public sealed class BannedApiEntry
{
    /// <summary>Creates an entry; see <see cref="BannedApiList.Parse"/> for the line format.</summary>
    public BannedApiEntry(string documentationId, string category, string reason, int line)
    {
        DocumentationId = documentationId;
        Category = category;
        Reason = reason;
        Line = line;
    }

    /// <summary>The documentation comment id, e.g. <c>P:System.DateTime.Now</c>.</summary>
    public string DocumentationId { get; }

    /// <summary>The id's kind letter: N, T, M, P, F or E.</summary>
    public char Kind => DocumentationId[0];

    /// <summary>The id without its kind prefix, e.g. <c>System.DateTime.Now</c>.</summary>
    public string Name => DocumentationId.Substring(2);

    /// <summary>One of <see cref="BannedApiList.Categories"/>.</summary>
    public string Category { get; }

    /// <summary>Why a plugin may not use it.</summary>
    public string Reason { get; }

    /// <summary>1-based line in the list.</summary>
    public int Line { get; }

    /// <summary>True when the entry is about determinism rather than reach (reported as CHSDK2001).</summary>
    public bool IsNondeterminism => Category == BannedApiList.NondeterminismCategory;

    /// <summary>"category: reason", as messages show it.</summary>
    public string Explanation => Category + ": " + Reason;
}
