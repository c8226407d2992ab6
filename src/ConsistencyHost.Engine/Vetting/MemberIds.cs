using System.Reflection.Metadata;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// The documentation ids a member reference may be banned under, most specific first: the method or field
/// itself, then the property or event an accessor belongs to (<c>get_Now</c> → <c>P:System.DateTime.Now</c>).
/// </summary>
internal static class MemberIds
{
    public static IEnumerable<string> For(MetadataReader reader, MemberReference member, MetadataTypeName type)
    {
        var name = reader.GetString(member.Name);
        var prefix = type.FullName + ".";
        if (member.GetKind() == MemberReferenceKind.Field)
        {
            yield return "F:" + prefix + name;
            yield break;
        }

        var signature = member.DecodeMethodSignature(DocIdSignatureProvider.Instance, null);
        var docName = name switch { ".ctor" => "#ctor", ".cctor" => "#cctor", _ => name };
        var arity = signature.GenericParameterCount > 0 ? "``" + signature.GenericParameterCount : "";
        var parameters = signature.ParameterTypes.Length > 0 ? "(" + string.Join(",", signature.ParameterTypes) + ")" : "";
        yield return "M:" + prefix + docName + arity + parameters;

        foreach (var (accessor, kind) in Accessors)
        {
            if (name.StartsWith(accessor, StringComparison.Ordinal))
            {
                yield return kind + prefix + name[accessor.Length..];
            }
        }
    }

    private static readonly (string Prefix, string Kind)[] Accessors =
        [("get_", "P:"), ("set_", "P:"), ("add_", "E:"), ("remove_", "E:")];
}
