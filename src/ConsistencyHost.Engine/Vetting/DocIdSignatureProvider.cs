using System.Collections.Immutable;
using System.Reflection.Metadata;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Decodes signature types into the spelling of documentation comment ids (C# standard, annex D.4.2):
/// <c>System.Int32</c>, <c>System.Byte[]</c>, <c>System.Func{``0}</c>, <c>`0</c>, <c>System.Int32@</c>.
/// </summary>
internal sealed class DocIdSignatureProvider : ISignatureTypeProvider<string, object?>
{
    /// <summary>The provider holds no state; one instance serves every reader.</summary>
    public static DocIdSignatureProvider Instance { get; } = new();

    public string GetPrimitiveType(PrimitiveTypeCode typeCode) => "System." + typeCode switch
    {
        PrimitiveTypeCode.IntPtr => "IntPtr",
        PrimitiveTypeCode.UIntPtr => "UIntPtr",
        _ => typeCode.ToString(),
    };

    public string GetTypeFromDefinition(MetadataReader metadata, TypeDefinitionHandle handle, byte rawTypeKind) =>
        MetadataNames.Of(metadata, handle).FullName;

    public string GetTypeFromReference(MetadataReader metadata, TypeReferenceHandle handle, byte rawTypeKind) =>
        MetadataNames.Of(metadata, handle).FullName;

    public string GetTypeFromSpecification(MetadataReader metadata, object? context, TypeSpecificationHandle handle, byte rawTypeKind) =>
        metadata.GetTypeSpecification(handle).DecodeSignature(this, context);

    public string GetSZArrayType(string elementType) => elementType + "[]";

    public string GetArrayType(string elementType, ArrayShape shape) =>
        elementType + "[" + string.Join(",", Enumerable.Repeat("0:", shape.Rank)) + "]";

    public string GetByReferenceType(string elementType) => elementType + "@";

    public string GetPointerType(string elementType) => elementType + "*";

    public string GetPinnedType(string elementType) => elementType;

    public string GetModifiedType(string modifier, string unmodifiedType, bool isRequired) => unmodifiedType;

    public string GetGenericInstantiation(string genericType, ImmutableArray<string> typeArguments)
    {
        var tick = genericType.LastIndexOf('`');
        return (tick > 0 ? genericType[..tick] : genericType) + "{" + string.Join(",", typeArguments) + "}";
    }

    public string GetGenericMethodParameter(object? genericContext, int index) => "``" + index;

    public string GetGenericTypeParameter(object? genericContext, int index) => "`" + index;

    public string GetFunctionPointerType(MethodSignature<string> signature) => "=FUNC:" + signature.ReturnType;
}
