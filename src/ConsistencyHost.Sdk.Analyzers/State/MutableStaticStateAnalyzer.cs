using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace ConsistencyHost.Sdk.Analyzers.State;

/// <summary>
/// Static fields that are not read-only, static auto-properties with a setter, and static fields or
/// properties of a mutable collection type or array (CHSDK2002). Constants and read-only fields of immutable
/// types are fine.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class MutableStaticStateAnalyzer : DiagnosticAnalyzer
{
    /// <summary>Diagnostic property set when adding <c>readonly</c> fixes the problem; read by the code fix.</summary>
    public const string AddReadOnlyProperty = "AddReadOnly";

    private static readonly ImmutableDictionary<string, string?> ReadOnlyFixable =
        ImmutableDictionary<string, string?>.Empty.Add(AddReadOnlyProperty, "true");

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } = ImmutableArray.Create(Descriptors.MutableStaticState);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.Analyze | GeneratedCodeAnalysisFlags.ReportDiagnostics);
        context.EnableConcurrentExecution();
        context.RegisterCompilationStartAction(start =>
        {
            if (SdkSymbols.For(start.Compilation) is not null)
            {
                start.RegisterSymbolAction(CheckField, SymbolKind.Field);
                start.RegisterSymbolAction(CheckProperty, SymbolKind.Property);
            }
        });
    }

    private static void CheckField(SymbolAnalysisContext context)
    {
        var field = (IFieldSymbol)context.Symbol;
        if (!field.IsStatic || field.IsConst || field.IsImplicitlyDeclared || field.ContainingType.TypeKind == TypeKind.Enum)
        {
            return;
        }

        var why = !field.IsReadOnly ? "a static field that is not readonly" : MutableTypeReason(field.Type);
        if (why is not null)
        {
            // Adding readonly is a complete fix only when the field's type is not itself mutable.
            var fixable = !field.IsReadOnly && MutableTypeReason(field.Type) is null;
            var properties = fixable ? ReadOnlyFixable : ImmutableDictionary<string, string?>.Empty;
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.MutableStaticState, field.Locations[0], properties, Name(field), why));
        }
    }

    private static void CheckProperty(SymbolAnalysisContext context)
    {
        var property = (IPropertySymbol)context.Symbol;
        if (!property.IsStatic || !IsAutoProperty(property))
        {
            return;
        }

        var why = property.SetMethod is not null ? "a static auto-property with a setter" : MutableTypeReason(property.Type);
        if (why is not null)
        {
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.MutableStaticState, property.Locations[0], Name(property), why));
        }
    }

    private static bool IsAutoProperty(IPropertySymbol property) =>
        property.ContainingType.GetMembers().OfType<IFieldSymbol>()
            .Any(f => SymbolEqualityComparer.Default.Equals(f.AssociatedSymbol, property));

    private static string? MutableTypeReason(ITypeSymbol type)
    {
        var isArray = type is IArrayTypeSymbol;
        var name = type is INamedTypeSymbol named ? MetadataName(named.OriginalDefinition) : "";
        return MutableTypes.IsMutable(name, isArray)
            ? $"a static of the mutable type '{type.ToDisplayString()}'; use an immutable or frozen collection"
            : null;
    }

    private static string MetadataName(INamedTypeSymbol type) =>
        type.ContainingNamespace is { IsGlobalNamespace: false } ns ? ns.ToDisplayString() + "." + type.MetadataName : type.MetadataName;

    private static string Name(ISymbol symbol) => symbol.ContainingType.Name + "." + symbol.Name;
}
