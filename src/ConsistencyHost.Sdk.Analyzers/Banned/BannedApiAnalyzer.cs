using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;

namespace ConsistencyHost.Sdk.Analyzers.Banned;

/// <summary>
/// Reports every use of an API on the banned list (CHSDK1001) or of a nondeterministic one (CHSDK2001):
/// calls, object creation, property, field, event and method-group references, typeof, attributes
/// (so P/Invoke declarations), base types, and unsafe code enabled for the compilation.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class BannedApiAnalyzer : DiagnosticAnalyzer
{
    private const string UnverifiableCodeId = "T:System.Security.UnverifiableCodeAttribute";

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } =
        ImmutableArray.Create(Descriptors.BannedApi, Descriptors.Nondeterminism);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        // Generated code is plugin code too: a generator must not smuggle a banned call past the check.
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.Analyze | GeneratedCodeAnalysisFlags.ReportDiagnostics);
        context.EnableConcurrentExecution();
        context.RegisterCompilationStartAction(Start);
    }

    private static void Start(CompilationStartAnalysisContext context)
    {
        if (SdkSymbols.For(context.Compilation) is null)
        {
            return;
        }

        var index = new BannedSymbolIndex(context.Compilation, BannedApiList.Embedded);
        context.RegisterOperationAction(c => Check(c, index, Referenced(c.Operation)),
            OperationKind.Invocation, OperationKind.ObjectCreation, OperationKind.PropertyReference,
            OperationKind.FieldReference, OperationKind.EventReference, OperationKind.MethodReference, OperationKind.TypeOf);
        context.RegisterSymbolAction(c => CheckDeclaration(c, index),
            SymbolKind.NamedType, SymbolKind.Method, SymbolKind.Field, SymbolKind.Property, SymbolKind.Event);
        context.RegisterCompilationEndAction(c => CheckCompilation(c, index));
    }

    private static ISymbol? Referenced(IOperation operation) => operation switch
    {
        IInvocationOperation invocation => invocation.TargetMethod,
        IObjectCreationOperation creation => (ISymbol?)creation.Constructor ?? creation.Type,
        IMemberReferenceOperation member => member.Member,
        ITypeOfOperation typeOf => typeOf.TypeOperand,
        _ => null,
    };

    private static void Check(OperationAnalysisContext context, BannedSymbolIndex index, ISymbol? symbol)
    {
        // Attributes (DllImport, LibraryImport, UnsafeAccessor, SkipLocalsInit) are reported once, by the declaration check.
        if (context.Operation.Syntax is AttributeSyntax)
        {
            return;
        }

        if (index.Find(symbol) is { } entry)
        {
            context.ReportDiagnostic(Create(entry, symbol!.ToDisplayString(), context.Operation.Syntax.GetLocation()));
        }
    }

    private static void CheckDeclaration(SymbolAnalysisContext context, BannedSymbolIndex index)
    {
        var symbol = context.Symbol;
        foreach (var attribute in symbol.GetAttributes())
        {
            if (index.FindType(attribute.AttributeClass) is { } entry)
            {
                var location = attribute.ApplicationSyntaxReference?.GetSyntax(context.CancellationToken).GetLocation() ?? symbol.Locations[0];
                context.ReportDiagnostic(Create(entry, attribute.AttributeClass!.ToDisplayString(), location));
            }
        }

        if (symbol is INamedTypeSymbol type && index.FindType(type.BaseType) is { } baseEntry)
        {
            context.ReportDiagnostic(Create(baseEntry, type.BaseType!.ToDisplayString(), symbol.Locations[0]));
        }
    }

    private static void CheckCompilation(CompilationAnalysisContext context, BannedSymbolIndex index)
    {
        if (context.Compilation.Options is CSharpCompilationOptions { AllowUnsafe: true } && index.ById(UnverifiableCodeId) is { } entry)
        {
            context.ReportDiagnostic(Create(entry, "unsafe code (AllowUnsafeBlocks)", Location.None));
        }

        foreach (var attribute in context.Compilation.Assembly.GetAttributes().AddRange(context.Compilation.SourceModule.GetAttributes()))
        {
            if (index.FindType(attribute.AttributeClass) is { } banned)
            {
                var location = attribute.ApplicationSyntaxReference?.GetSyntax(context.CancellationToken).GetLocation() ?? Location.None;
                context.ReportDiagnostic(Create(banned, attribute.AttributeClass!.ToDisplayString(), location));
            }
        }
    }

    private static Diagnostic Create(BannedApiEntry entry, string used, Location location) =>
        Diagnostic.Create(entry.IsNondeterminism ? Descriptors.Nondeterminism : Descriptors.BannedApi, location,
            used, entry.DocumentationId, entry.Explanation);
}
