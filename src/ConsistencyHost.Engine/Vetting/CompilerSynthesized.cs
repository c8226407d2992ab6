namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Banned APIs that the C# compiler itself emits calls to, inside types it generates (names starting with
/// '&lt;', which C# source cannot declare): iterator state machines read
/// <c>Environment.CurrentManagedThreadId</c> in <c>GetEnumerator</c>, and collection expressions over inline
/// arrays call <c>Unsafe</c> in <c>&lt;PrivateImplementationDetails&gt;</c>. Only these, and only there, are
/// exempt; the same call in an author's own type is refused.
/// </summary>
internal static class CompilerSynthesized
{
    private static readonly HashSet<string> Exempt = new(StringComparer.Ordinal)
    {
        "P:System.Environment.CurrentManagedThreadId",
        "T:System.Runtime.CompilerServices.Unsafe",
    };

    /// <summary>True when the use of the API <paramref name="usedId"/> from <paramref name="usingType"/> is the compiler's.</summary>
    public static bool IsExempt(string usedId, string usingType) =>
        Exempt.Contains(usedId) && usingType.Split('.').Any(part => part.StartsWith('<'));
}
