using System.Reflection;
using System.Reflection.Metadata;
using ConsistencyHost.Sdk.Analyzers;
using ConsistencyHost.Sdk.Analyzers.State;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Mutable static state in compiled form, by the rules of the CHSDK2002 analyzer: a static field that is not
/// init-only (an auto-property's backing field counts as the property), or one whose declared type is a
/// mutable collection or array. Fields of compiler-generated types (lambda caches, data blobs) are skipped.
/// </summary>
internal static class StaticState
{
    private const string BackingFieldSuffix = ">k__BackingField";

    public static VettingProblem? Problem(MetadataReader reader, TypeDefinitionHandle typeHandle, FieldDefinitionHandle handle)
    {
        var field = reader.GetFieldDefinition(handle);
        if ((field.Attributes & FieldAttributes.Static) == 0 || (field.Attributes & FieldAttributes.Literal) != 0 ||
            IsCompilerGenerated(reader, typeHandle))
        {
            return null;
        }

        var name = reader.GetString(field.Name);
        var isProperty = name.StartsWith('<') && name.EndsWith(BackingFieldSuffix, StringComparison.Ordinal);
        var display = isProperty ? name[1..^BackingFieldSuffix.Length] : name;
        var why = (field.Attributes & FieldAttributes.InitOnly) == 0
            ? isProperty ? "a static auto-property with a setter" : "a static field that is not readonly"
            : MutableTypeReason(field.DecodeSignature(DocIdSignatureProvider.Instance, null));
        return why is null
            ? null
            : new VettingProblem(Descriptors.MutableStaticState.Id, MetadataNames.Of(reader, typeHandle).FullName + "." + display,
                "mutable static state: " + why, null);
    }

    private static string? MutableTypeReason(string docIdType)
    {
        var isArray = docIdType.EndsWith(']');
        return MutableTypes.IsMutable(MetadataName(docIdType), isArray) ? $"a static of the mutable type '{docIdType}'" : null;
    }

    /// <summary><c>System.Collections.Generic.Dictionary{System.String,System.Int32}</c> → <c>…Dictionary`2</c>.</summary>
    private static string MetadataName(string docIdType)
    {
        var brace = docIdType.IndexOf('{');
        if (brace < 0) return docIdType;
        var depth = 0;
        var arity = 1;
        foreach (var c in docIdType[(brace + 1)..])
        {
            depth += c == '{' ? 1 : c == '}' ? -1 : 0;
            if (c == ',' && depth == 0) arity++;
        }

        return docIdType[..brace] + "`" + arity;
    }

    private static bool IsCompilerGenerated(MetadataReader reader, TypeDefinitionHandle handle)
    {
        for (var current = handle; !current.IsNil; current = reader.GetTypeDefinition(current).GetDeclaringType())
        {
            if (reader.GetString(reader.GetTypeDefinition(current).Name).StartsWith('<')) return true;
        }

        return false;
    }
}
