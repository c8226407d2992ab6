using ConsistencyHost.Sdk.Analyzers;
using ConsistencyHost.Sdk.Analyzers.Allowed;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// The allow-list as the host reads it: from the SDK assembly's resource, the very file the analyzers embed,
/// with the same meaning (see <see cref="AllowedSymbolIndex"/>): a namespace and below, a type with its nested
/// types and members, or one member, whose type may then be named but not otherwise used.
/// </summary>
internal sealed class HostAllowedList
{
    private readonly HashSet<string> _namespaces = new(StringComparer.Ordinal);
    private readonly HashSet<string> _types = new(StringComparer.Ordinal);
    private readonly HashSet<string> _members = new(StringComparer.Ordinal);
    private readonly HashSet<string> _namedThroughMember = new(StringComparer.Ordinal);

    public HostAllowedList(AllowedApiList list)
    {
        foreach (var id in list.DocumentationIds)
        {
            var name = id[2..];
            switch (id[0])
            {
                case 'N': _namespaces.Add(name); break;
                case 'T': _types.Add(name); break;
                default:
                    _members.Add(id);
                    _namedThroughMember.Add(ContainingType(name));
                    break;
            }
        }
    }

    /// <summary>The list embedded in ConsistencyHost.Sdk.</summary>
    public static HostAllowedList FromSdk { get; } = new(AllowedApiList.Parse(ApiListResource.Read(typeof(IRule).Assembly, AllowedApiList.ResourceName)));

    /// <summary>True when one of a member reference's ids (<see cref="MemberIds"/>) is listed, or its type is.</summary>
    public bool AllowsMember(IEnumerable<string> memberIds, MetadataTypeName type) => memberIds.Any(_members.Contains) || ListsType(type);

    /// <summary>True when the type may be named: it is listed (itself, a container or its namespace) or one of its members is.</summary>
    public bool AllowsType(MetadataTypeName type) => ListsType(type) || _namedThroughMember.Contains(type.FullName);

    private bool ListsType(MetadataTypeName type) =>
        type.SelfAndContainers().Any(_types.Contains) || type.NamespaceAndParents().Any(_namespaces.Contains);

    /// <summary><c>System.Object.Equals(System.Object)</c> → <c>System.Object</c>: the part before the member name.</summary>
    private static string ContainingType(string memberName)
    {
        var paren = memberName.IndexOf('(');
        var head = paren < 0 ? memberName : memberName[..paren];
        return head[..head.LastIndexOf('.')];
    }
}
