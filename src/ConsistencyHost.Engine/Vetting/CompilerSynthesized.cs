using System.Text.RegularExpressions;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// APIs off the lists that the C# compiler itself emits calls to, in bodies that hold none of the author's code:
/// iterator state machines read <c>Environment.CurrentManagedThreadId</c> in their constructor and
/// <c>GetEnumerator</c>, and the helpers in <c>&lt;PrivateImplementationDetails&gt;</c> behind collection
/// expressions and <c>params ReadOnlySpan</c> arguments over inline arrays call <c>Unsafe</c> and
/// <c>MemoryMarshal.Create(ReadOnly)Span</c> with the inline array's own length. Only these, and only there, are
/// exempt. The author's code in compiler-named types — an iterator's <c>MoveNext</c>, a lambda's <c>&lt;&gt;c</c>
/// class, a <c>file</c> type — is vetted like any other.
/// </summary>
internal static partial class CompilerSynthesized
{
    private const string PrivateImplementationDetails = "<PrivateImplementationDetails>";
    private const string ThreadIdOfIterator = "P:System.Environment.CurrentManagedThreadId";

    private static readonly HashSet<string> InPrivateImplementationDetails = new(StringComparer.Ordinal)
    {
        "T:System.Runtime.CompilerServices.Unsafe",
        "M:System.Runtime.InteropServices.MemoryMarshal.CreateReadOnlySpan``1(``0@,System.Int32)",
        "M:System.Runtime.InteropServices.MemoryMarshal.CreateSpan``1(``0@,System.Int32)",
    };

    /// <summary>An iterator's state machine: <c>&lt;Check&gt;d__3</c>.</summary>
    [GeneratedRegex(@"^<[^>]+>d__[0-9]+$")]
    private static partial Regex IteratorStateMachine();

    /// <summary>True when the use of the API <paramref name="usedId"/> at <paramref name="site"/> is the compiler's.</summary>
    public static bool IsExempt(string usedId, Site site) =>
        (InPrivateImplementationDetails.Contains(usedId) && site.Type is { Namespace: "", Nested: [PrivateImplementationDetails] }) ||
        (usedId == ThreadIdOfIterator && site.Type.Nested.Count > 1 && IteratorStateMachine().IsMatch(site.Type.Nested[^1]) &&
         (site.Method == ".ctor" || site.Method.EndsWith("GetEnumerator", StringComparison.Ordinal)));

    /// <summary>Where a use is: the declaring type and the name of the method whose body holds it.</summary>
    public sealed record Site(MetadataTypeName Type, string Method);
}
