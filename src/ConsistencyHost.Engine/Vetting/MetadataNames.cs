using System.Reflection.Metadata;
using System.Text.RegularExpressions;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>Names of types and members read from metadata, in documentation-id spelling.</summary>
internal static partial class MetadataNames
{
    [GeneratedRegex("^<(?<name>[^>]+)>")]
    private static partial Regex CompilerGeneratedPrefix();

    public static MetadataTypeName Of(MetadataReader reader, TypeReferenceHandle handle)
    {
        var type = reader.GetTypeReference(handle);
        var name = reader.GetString(type.Name);
        return type.ResolutionScope.Kind == HandleKind.TypeReference
            ? Of(reader, (TypeReferenceHandle)type.ResolutionScope).Child(name)
            : new MetadataTypeName(reader.GetString(type.Namespace), [name]);
    }

    public static MetadataTypeName Of(MetadataReader reader, TypeDefinitionHandle handle)
    {
        var type = reader.GetTypeDefinition(handle);
        var name = reader.GetString(type.Name);
        var declaring = type.GetDeclaringType();
        return declaring.IsNil ? new MetadataTypeName(reader.GetString(type.Namespace), [name]) : Of(reader, declaring).Child(name);
    }

    /// <summary>The type a member reference's parent names; for a generic instantiation, its generic definition.</summary>
    public static MetadataTypeName? OfParent(MetadataReader reader, EntityHandle parent) => parent.Kind switch
    {
        HandleKind.TypeReference => Of(reader, (TypeReferenceHandle)parent),
        HandleKind.TypeDefinition => Of(reader, (TypeDefinitionHandle)parent),
        HandleKind.TypeSpecification => GenericDefinition(reader, (TypeSpecificationHandle)parent),
        _ => null,
    };

    /// <summary>The generic type definition of an instantiation (<c>List&lt;int&gt;</c> → <c>List`1</c>); null otherwise.</summary>
    public static MetadataTypeName? GenericDefinition(MetadataReader reader, TypeSpecificationHandle handle)
    {
        var definition = GenericDefinitionHandle(reader, handle);
        return definition.Kind == HandleKind.TypeReference ? Of(reader, (TypeReferenceHandle)definition)
            : definition.Kind == HandleKind.TypeDefinition ? Of(reader, (TypeDefinitionHandle)definition) : null;
    }

    /// <summary>The handle of an instantiation's generic type definition; a nil handle for any other type specification.</summary>
    public static EntityHandle GenericDefinitionHandle(MetadataReader reader, TypeSpecificationHandle handle)
    {
        var blob = reader.GetBlobReader(reader.GetTypeSpecification(handle).Signature);
        if (blob.ReadSignatureTypeCode() != SignatureTypeCode.GenericTypeInstance)
        {
            return default;
        }

        blob.ReadSignatureTypeCode();
        return blob.ReadTypeHandle();
    }

    /// <summary>
    /// A plugin member as its author wrote it: compiler-generated iterator, async, lambda and local-function
    /// members are named after the method they came from (<c>&lt;Check&gt;d__1.MoveNext</c> → <c>Rule.Check</c>).
    /// </summary>
    public static string Describe(MetadataReader reader, MethodDefinitionHandle handle)
    {
        var method = reader.GetMethodDefinition(handle);
        return DescribeMember(reader, method.GetDeclaringType(), reader.GetString(method.Name));
    }

    public static string DescribeMember(MetadataReader reader, TypeDefinitionHandle declaring, string memberName)
    {
        var type = reader.GetTypeDefinition(declaring);
        var outer = type.GetDeclaringType();
        if (!outer.IsNil && reader.GetString(type.Name).StartsWith('<'))
        {
            // <Check>d__3 (an iterator) names its method; <>c and display classes do not, their members do.
            return DescribeMember(reader, outer, Origin(reader.GetString(type.Name)) ?? Origin(memberName) ?? memberName);
        }

        return Of(reader, declaring).FullName + "." + (Origin(memberName) ?? memberName);
    }

    /// <summary>"&lt;Check&gt;b__0_0" → "Check"; null for names that carry no method ("&lt;&gt;c", plain names).</summary>
    private static string? Origin(string generatedName) =>
        CompilerGeneratedPrefix().Match(generatedName) is { Success: true } match ? match.Groups["name"].Value : null;
}
