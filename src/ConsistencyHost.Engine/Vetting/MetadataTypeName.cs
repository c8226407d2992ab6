namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// A type's name as documentation ids write it: namespace, then enclosing types and the type joined by dots,
/// generic arity kept (<c>System.Collections.Generic.List`1</c>).
/// </summary>
internal sealed record MetadataTypeName(string Namespace, IReadOnlyList<string> Nested)
{
    /// <summary>The full name, e.g. <c>System.Environment.SpecialFolder</c>.</summary>
    public string FullName => Namespace.Length == 0 ? string.Join('.', Nested) : Namespace + "." + string.Join('.', Nested);

    /// <summary>The full names of the type and of each type it is nested in, innermost first.</summary>
    public IEnumerable<string> SelfAndContainers()
    {
        for (var depth = Nested.Count; depth > 0; depth--)
        {
            var path = string.Join('.', Nested.Take(depth));
            yield return Namespace.Length == 0 ? path : Namespace + "." + path;
        }
    }

    /// <summary>The namespace and each namespace it is in, innermost first (<c>System.IO.Pipes</c>, <c>System.IO</c>, <c>System</c>).</summary>
    public IEnumerable<string> NamespaceAndParents()
    {
        for (var ns = Namespace; ns.Length > 0; ns = ns.LastIndexOf('.') is var dot and > 0 ? ns[..dot] : "")
        {
            yield return ns;
        }
    }

    /// <summary>A type nested in this one.</summary>
    public MetadataTypeName Child(string name) => this with { Nested = [.. Nested, name] };

    public override string ToString() => FullName;
}
