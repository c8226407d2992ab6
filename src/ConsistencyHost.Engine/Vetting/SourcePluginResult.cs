namespace ConsistencyHost.Engine.Vetting;

/// <summary>The outcome of compiling and vetting a source plugin.</summary>
/// <param name="AssemblyPath">The vetted assembly in the cache, ready to load; null when refused.</param>
/// <param name="Problems">Why it was refused: compiler errors and every CHSDK diagnostic, suppressed ones included.</param>
/// <param name="FromCache">True when an earlier compilation of the same sources was reused.</param>
public sealed record SourcePluginResult(string? AssemblyPath, IReadOnlyList<VettingProblem> Problems, bool FromCache)
{
    /// <summary>True when the plugin may be loaded.</summary>
    public bool IsAccepted => AssemblyPath is not null && Problems.Count == 0;
}
