using System.Reflection.Metadata;
using System.Reflection.PortableExecutable;
using ConsistencyHost.Sdk.Analyzers;
using ConsistencyHost.Sdk.Analyzers.Banned;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// One pass over an assembly's metadata for <see cref="CompiledPluginVetter"/>: method bodies (with the
/// plugin member each use is attributed to), P/Invoke, finalizers, attributes, base types and static fields,
/// then every type reference not yet attributed, so that a type used only in a signature is still caught.
/// Each external type and member is refused when it is banned (the list's reason) or not on the allow-list.
/// </summary>
internal sealed class MetadataScan(PEReader pe, MetadataReader reader, HostBannedList banned, HostAllowedList allowed)
{
    private const string FinalizeApi = "System.Object.Finalize";
    private const string PInvokeId = "T:System.Runtime.InteropServices.DllImportAttribute";
    private readonly HashSet<string> _seen = new(StringComparer.Ordinal);
    private readonly HashSet<string> _typesWithOwner = new(StringComparer.Ordinal);

    public List<VettingProblem> Problems { get; } = [];

    public void Run()
    {
        foreach (var typeHandle in reader.TypeDefinitions)
        {
            var type = reader.GetTypeDefinition(typeHandle);
            CheckBaseType(typeHandle, type);
            foreach (var method in type.GetMethods()) CheckMethod(method);
            foreach (var field in type.GetFields()) CheckStaticField(typeHandle, field);
        }

        foreach (var attribute in reader.CustomAttributes) CheckAttribute(reader.GetCustomAttribute(attribute));
        foreach (var reference in reader.TypeReferences) CheckUnattributedType(reference);
    }

    private void CheckMethod(MethodDefinitionHandle handle)
    {
        var method = reader.GetMethodDefinition(handle);
        var import = method.GetImport();
        if (!import.Module.IsNil && banned.ById(PInvokeId) is { } pinvoke)
        {
            var library = reader.GetString(reader.GetModuleReference(import.Module).Name);
            Add(pinvoke, $"P/Invoke into '{library}'", MetadataNames.Describe(reader, handle), null);
        }

        if (method.RelativeVirtualAddress == 0)
        {
            return;
        }

        var owner = MetadataNames.Describe(reader, handle);
        if (IsFinalizer(method))
        {
            // A finalizer runs on the runtime's finalizer thread, after and outside the rule's run.
            AddNotAllowed(FinalizeApi, owner, null);
        }

        var usingType = new CompilerSynthesized.Site(MetadataNames.Of(reader, method.GetDeclaringType()), reader.GetString(method.Name));
        foreach (var token in ILTokens.Of(pe.GetMethodBody(method.RelativeVirtualAddress)))
        {
            CheckToken(token, owner, usingType);
        }
    }

    private void CheckToken(EntityHandle token, string owner, CompilerSynthesized.Site usingType)
    {
        switch (token.Kind)
        {
            case HandleKind.MemberReference:
                CheckMemberReference((MemberReferenceHandle)token, owner, usingType);
                break;
            case HandleKind.MethodSpecification:
                CheckToken(reader.GetMethodSpecification((MethodSpecificationHandle)token).Method, owner, usingType);
                break;
            case HandleKind.TypeReference:
                var type = MetadataNames.Of(reader, (TypeReferenceHandle)token);
                if (Exempted(["T:" + type.FullName], type, usingType)) break;
                if (banned.FindType(type) is { } entry) Add(entry, type.FullName, owner, type);
                else if (!allowed.AllowsType(type)) AddNotAllowed(type.FullName, owner, type);
                break;
        }
    }

    private bool Exempted(IEnumerable<string> usedIds, MetadataTypeName type, CompilerSynthesized.Site usingType)
    {
        if (!usedIds.Append("T:" + type.FullName).Any(id => CompilerSynthesized.IsExempt(id, usingType)))
        {
            return false;
        }

        _typesWithOwner.Add(type.FullName);
        return true;
    }

    private void CheckMemberReference(MemberReferenceHandle handle, string owner, CompilerSynthesized.Site usingType)
    {
        var member = reader.GetMemberReference(handle);
        if (MetadataNames.OfParent(reader, member.Parent) is not { } type)
        {
            return;
        }

        var ids = MemberIds.For(reader, member, type).ToList();
        if (IsDefinedHere(member.Parent) || Exempted(ids, type, usingType))
        {
            return;
        }

        if (banned.FindMember(ids, type) is { } entry)
        {
            // Name the member as the list does when the list names it (P:System.DateTime.Now, not get_Now).
            var api = ids.FirstOrDefault(id => id == entry.DocumentationId) ?? ids[0];
            Add(entry, api[2..], owner, type);
        }
        else if (!allowed.AllowsMember(ids, type))
        {
            AddNotAllowed(ids[0][2..], owner, type);
        }
    }

    private void CheckBaseType(TypeDefinitionHandle handle, TypeDefinition type)
    {
        if (type.BaseType.IsNil || IsDefinedHere(type.BaseType) || MetadataNames.OfParent(reader, type.BaseType) is not { } baseType)
        {
            return;
        }

        var owner = MetadataNames.Of(reader, handle).FullName;
        if (banned.FindType(baseType) is { } entry) Add(entry, baseType.FullName, owner, baseType);
        else if (!allowed.AllowsType(baseType)) AddNotAllowed(baseType.FullName, owner, baseType);
    }

    private void CheckAttribute(CustomAttribute attribute)
    {
        var type = attribute.Constructor.Kind == HandleKind.MemberReference
            ? MetadataNames.OfParent(reader, reader.GetMemberReference((MemberReferenceHandle)attribute.Constructor).Parent)
            : null;
        if (type is null)
        {
            return;
        }

        if (banned.FindType(type) is { } entry) Add(entry, "[" + type.FullName + "]", AttributeOwner(attribute.Parent), type);
        else if (!allowed.AllowsType(type)) AddNotAllowed("[" + type.FullName + "]", AttributeOwner(attribute.Parent), type);
    }

    private void CheckStaticField(TypeDefinitionHandle typeHandle, FieldDefinitionHandle handle)
    {
        if (StaticState.Problem(reader, typeHandle, handle) is { } problem && _seen.Add(problem.ToString()))
        {
            Problems.Add(problem);
        }
    }

    private void CheckUnattributedType(TypeReferenceHandle handle)
    {
        var type = MetadataNames.Of(reader, handle);
        if (_typesWithOwner.Contains(type.FullName))
        {
            return;
        }

        if (banned.FindType(type) is { } entry) Add(entry, type.FullName, null, type);
        else if (!allowed.AllowsType(type)) AddNotAllowed(type.FullName, null, type);
    }

    private string? AttributeOwner(EntityHandle parent) => parent.Kind switch
    {
        HandleKind.MethodDefinition => MetadataNames.Describe(reader, (MethodDefinitionHandle)parent),
        HandleKind.TypeDefinition => MetadataNames.Of(reader, (TypeDefinitionHandle)parent).FullName,
        HandleKind.AssemblyDefinition => "the assembly",
        HandleKind.ModuleDefinition => "the module",
        _ => null,
    };

    private void Add(BannedApiEntry entry, string api, string? owner, MetadataTypeName? type) =>
        Add(entry.IsNondeterminism ? Descriptors.Nondeterminism.Id : Descriptors.BannedApi.Id, api,
            $"banned by {entry.DocumentationId} ({entry.Explanation})", owner, type);

    private void AddNotAllowed(string api, string? owner, MetadataTypeName? type) =>
        Add(Descriptors.NotAllowed.Id, api, NotAllowedReason, owner, type);

    private void Add(string code, string api, string because, string? owner, MetadataTypeName? type)
    {
        if (type is not null && owner is not null) _typesWithOwner.Add(type.FullName);
        var problem = new VettingProblem(code, api, because, owner);
        if (_seen.Add(problem.ToString())) Problems.Add(problem);
    }

    /// <summary>How a refusal for an API off the allow-list reads, after the API's name.</summary>
    public const string NotAllowedReason = "not on the allow-list of APIs a rule plugin may use (AllowedApis.txt)";

    /// <summary>True for a parent that is this assembly's own type or an instantiation of one: the plugin's own code is vetted where it is defined.</summary>
    private bool IsDefinedHere(EntityHandle parent) => parent.Kind switch
    {
        HandleKind.TypeDefinition or HandleKind.MethodDefinition => true,
        HandleKind.TypeSpecification => MetadataNames.GenericDefinitionHandle(reader, (TypeSpecificationHandle)parent).Kind == HandleKind.TypeDefinition,
        _ => false,
    };

    /// <summary>
    /// A virtual, parameterless, void method named Finalize overrides Object.Finalize whatever its body holds
    /// (hand-written IL need not call the base, so the call alone does not reveal it).
    /// </summary>
    private bool IsFinalizer(MethodDefinition method) =>
        (method.Attributes & System.Reflection.MethodAttributes.Virtual) != 0 && reader.StringComparer.Equals(method.Name, "Finalize") &&
        method.DecodeSignature(DocIdSignatureProvider.Instance, null) is { ParameterTypes.Length: 0, ReturnType: "System.Void" };

}
