using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Diagnostics;

namespace ConsistencyHost.Sdk.Analyzers.Contract;

/// <summary>
/// An options property of a non-nullable reference type needs an initialiser (CHSDK3004): the host creates
/// options with <c>new()</c> and only sets what a profile names, so without one the "non-nullable" option
/// is null at run time. Value types, nullable properties and computed properties are fine.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class OptionsDefaultsAnalyzer : DiagnosticAnalyzer
{
    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } = ImmutableArray.Create(Descriptors.OptionsDefault);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterCompilationStartAction(start =>
        {
            if (SdkSymbols.For(start.Compilation) is { RuleOptions: not null } sdk)
            {
                start.RegisterSymbolAction(c => Check(c, sdk), SymbolKind.Property);
            }
        });
    }

    private static void Check(SymbolAnalysisContext context, SdkSymbols sdk)
    {
        var property = (IPropertySymbol)context.Symbol;
        if (property.IsStatic || property.SetMethod is null || !property.Type.IsReferenceType ||
            property.NullableAnnotation != NullableAnnotation.NotAnnotated || !sdk.IsOptionsType(property.ContainingType))
        {
            return;
        }

        foreach (var reference in property.DeclaringSyntaxReferences)
        {
            if (reference.GetSyntax(context.CancellationToken) is PropertyDeclarationSyntax { Initializer: null, ExpressionBody: null } declaration &&
                IsAuto(declaration))
            {
                context.ReportDiagnostic(Diagnostic.Create(Descriptors.OptionsDefault, declaration.Identifier.GetLocation(),
                    property.Name, property.Type.ToDisplayString()));
            }
        }
    }

    private static bool IsAuto(PropertyDeclarationSyntax declaration)
    {
        if (declaration.AccessorList is null)
        {
            return false;
        }

        foreach (var accessor in declaration.AccessorList.Accessors)
        {
            if (accessor.Body is not null || accessor.ExpressionBody is not null)
            {
                return false;
            }
        }

        return true;
    }
}
