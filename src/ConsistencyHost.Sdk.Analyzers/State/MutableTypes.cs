using System.Collections.Generic;

namespace ConsistencyHost.Sdk.Analyzers.State;

/// <summary>
/// Declared types whose instances can be changed through the field that holds them. The host's compiled-plugin
/// vetting uses the same list, by metadata name, so that build and load time agree.
/// </summary>
public static class MutableTypes
{
    private static readonly HashSet<string> Names = new HashSet<string>(System.StringComparer.Ordinal)
    {
        "System.Collections.Generic.List`1",
        "System.Collections.Generic.Dictionary`2",
        "System.Collections.Generic.HashSet`1",
        "System.Collections.Generic.Queue`1",
        "System.Collections.Generic.Stack`1",
        "System.Collections.Generic.LinkedList`1",
        "System.Collections.Generic.SortedDictionary`2",
        "System.Collections.Generic.SortedList`2",
        "System.Collections.Generic.SortedSet`1",
        "System.Collections.Generic.PriorityQueue`2",
        "System.Collections.Generic.ICollection`1",
        "System.Collections.Generic.IList`1",
        "System.Collections.Generic.IDictionary`2",
        "System.Collections.Generic.ISet`1",
        "System.Collections.ArrayList",
        "System.Collections.Hashtable",
        "System.Collections.Queue",
        "System.Collections.Stack",
        "System.Collections.SortedList",
        "System.Collections.BitArray",
        "System.Text.StringBuilder",
    };

    /// <summary>Metadata names (namespace, name with generic arity) of mutable collection types.</summary>
    public static IReadOnlyCollection<string> CollectionNames => Names;

    /// <summary>Every type in this namespace is a mutable collection.</summary>
    public const string ConcurrentNamespace = "System.Collections.Concurrent";

    /// <summary>True when a type of this metadata name (or an array, <paramref name="isArray"/>) can be mutated in place.</summary>
    public static bool IsMutable(string metadataName, bool isArray) =>
        isArray || Names.Contains(metadataName) ||
        metadataName.StartsWith(ConcurrentNamespace + ".", System.StringComparison.Ordinal);
}
