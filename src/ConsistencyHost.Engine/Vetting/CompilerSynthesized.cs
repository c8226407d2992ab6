using System.Text.RegularExpressions;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Banned APIs that the C# compiler itself emits calls to, inside types it generates (names starting with
/// '&lt;', which C# source cannot declare): iterator state machines read
/// <c>Environment.CurrentManagedThreadId</c> in <c>GetEnumerator</c>, and collection expressions over inline
/// arrays call <c>Unsafe</c> in <c>&lt;PrivateImplementationDetails&gt;</c>. Only these, and only there, are
/// exempt; the same call in an author's own type is refused — also in a <c>file</c> type, whose metadata name
/// (<c>&lt;Rule_cs&gt;F1A2B…__Helper</c>) starts with '&lt;' too but holds the author's code.
/// </summary>
internal static partial class CompilerSynthesized
{
    [GeneratedRegex("^<[^>]*>F[0-9A-Fa-f]+__")]
    private static partial Regex FileLocalType();

    private static readonly HashSet<string> Exempt = new(StringComparer.Ordinal)
    {
        "P:System.Environment.CurrentManagedThreadId",
        "T:System.Runtime.CompilerServices.Unsafe",
    };

    /// <summary>True when the use of the API <paramref name="usedId"/> from <paramref name="usingType"/> is the compiler's.</summary>
    public static bool IsExempt(string usedId, string usingType) =>
        Exempt.Contains(usedId) && usingType.Split('.').Any(part => part.StartsWith('<') && !FileLocalType().IsMatch(part));
}
