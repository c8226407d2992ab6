using System.Collections.Generic;
using System.Collections.Immutable;
using ConsistencyHost.Sdk.Analyzers.Banned;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;

namespace ConsistencyHost.Sdk.Analyzers.Allowed;

/// <summary>
/// Reports every API a plugin references that is not on the allow-list (CHSDK1002): calls, object creation,
/// member references, operators, typeof, locals, signatures, base types, attributes, finalizers and
/// <c>dynamic</c>. An API on the banned list is left to <see cref="BannedApiAnalyzer"/>, which names its reason.
/// </summary>
[DiagnosticAnalyzer(Microsoft.CodeAnalysis.LanguageNames.CSharp)]
public sealed class AllowListAnalyzer : DiagnosticAnalyzer
{
    /// <summary>How a dynamic operation is named: the runtime binder it compiles to is not on the list.</summary>
    public const string DynamicApi = "dynamic (Microsoft.CSharp.RuntimeBinder)";

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } = ImmutableArray.Create(Descriptors.NotAllowed);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
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

        var policy = new Policy(new AllowedSymbolIndex(context.Compilation, AllowedApiList.Embedded),
            new BannedSymbolIndex(context.Compilation, BannedApiList.Embedded));
        context.RegisterOperationAction(c => CheckOperation(c, policy),
            OperationKind.Invocation, OperationKind.ObjectCreation, OperationKind.PropertyReference, OperationKind.FieldReference,
            OperationKind.EventReference, OperationKind.MethodReference, OperationKind.TypeOf, OperationKind.Binary,
            OperationKind.Unary, OperationKind.Conversion, OperationKind.VariableDeclarator);
        context.RegisterOperationAction(CheckDynamic, OperationKind.DynamicInvocation, OperationKind.DynamicMemberReference,
            OperationKind.DynamicObjectCreation, OperationKind.DynamicIndexerAccess);
        context.RegisterSymbolAction(c => CheckDeclaration(c, policy),
            SymbolKind.NamedType, SymbolKind.Method, SymbolKind.Field, SymbolKind.Property, SymbolKind.Event);
        context.RegisterCompilationEndAction(c => CheckAssemblyAttributes(c, policy));
    }

    /// <summary>One report per dynamic operation: a member reference that is the target of a dynamic call is the call's.</summary>
    private static void CheckDynamic(OperationAnalysisContext context)
    {
        if (context.Operation is not IDynamicMemberReferenceOperation { Parent: IDynamicInvocationOperation })
        {
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.NotAllowed, context.Operation.Syntax.GetLocation(), DynamicApi));
        }
    }

    private static void CheckOperation(OperationAnalysisContext context, Policy policy)
    {
        // Attributes are reported once, by the declaration check.
        if (context.Operation.Syntax is AttributeSyntax || context.Operation.Syntax.FirstAncestorOrSelf<AttributeSyntax>() is not null)
        {
            return;
        }

        var symbol = context.Operation switch
        {
            IInvocationOperation invocation => invocation.TargetMethod,
            IObjectCreationOperation creation => (ISymbol?)creation.Constructor ?? creation.Type,
            IMemberReferenceOperation member => member.Member,
            ITypeOfOperation typeOf => typeOf.TypeOperand,
            IBinaryOperation binary => binary.OperatorMethod,
            IUnaryOperation unary => unary.OperatorMethod,
            IConversionOperation conversion => conversion.OperatorMethod,
            // A 'var' local has the type of its initialiser, which is checked where it is made.
            IVariableDeclaratorOperation declarator when declarator.Syntax.Parent is not VariableDeclarationSyntax { Type.IsVar: true } => declarator.Symbol.Type,
            _ => null,
        };
        policy.Report(symbol, context.Operation.Syntax.GetLocation(), context.ReportDiagnostic);
    }

    private static void CheckDeclaration(SymbolAnalysisContext context, Policy policy)
    {
        var symbol = context.Symbol;
        var location = symbol.Locations.Length > 0 ? symbol.Locations[0] : Location.None;
        foreach (var attribute in symbol.GetAttributes())
        {
            policy.Report(attribute.AttributeClass, AttributeLocation(attribute, location, context.CancellationToken), context.ReportDiagnostic);
        }

        foreach (var used in DeclaredTypes(symbol))
        {
            policy.Report(used, location, context.ReportDiagnostic);
        }

        // A finalizer runs on the runtime's finalizer thread, after and outside the rule's run.
        if (symbol is IMethodSymbol { MethodKind: MethodKind.Destructor } finalizer)
        {
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.NotAllowed, location,
                $"finalizer {finalizer.ToDisplayString()} (System.Object.Finalize)"));
        }
    }

    private static IEnumerable<ITypeSymbol?> DeclaredTypes(ISymbol symbol)
    {
        switch (symbol)
        {
            case INamedTypeSymbol type:
                yield return type.BaseType;
                foreach (var implemented in type.Interfaces) yield return implemented;
                break;
            case IMethodSymbol { MethodKind: not (MethodKind.PropertyGet or MethodKind.PropertySet or MethodKind.EventAdd or MethodKind.EventRemove) } method:
                yield return method.ReturnType;
                foreach (var parameter in method.Parameters) yield return parameter.Type;
                break;
            case IFieldSymbol { IsImplicitlyDeclared: false } field:
                yield return field.Type;
                break;
            case IPropertySymbol property:
                yield return property.Type;
                break;
            case IEventSymbol @event:
                yield return @event.Type;
                break;
        }
    }

    private static void CheckAssemblyAttributes(CompilationAnalysisContext context, Policy policy)
    {
        foreach (var attribute in context.Compilation.Assembly.GetAttributes().AddRange(context.Compilation.SourceModule.GetAttributes()))
        {
            policy.Report(attribute.AttributeClass, AttributeLocation(attribute, Location.None, context.CancellationToken), context.ReportDiagnostic);
        }
    }

    private static Location AttributeLocation(AttributeData attribute, Location fallback, System.Threading.CancellationToken cancellationToken) =>
        attribute.ApplicationSyntaxReference?.GetSyntax(cancellationToken).GetLocation() ?? fallback;

    /// <summary>The two lists together: banned symbols are the banned analyzer's to report, the rest must be allowed.</summary>
    private sealed class Policy(AllowedSymbolIndex allowed, BannedSymbolIndex banned)
    {
        public void Report(ISymbol? symbol, Location location, System.Action<Diagnostic> report)
        {
            if (symbol is null || banned.Find(symbol) is not null || (symbol is ITypeSymbol type && banned.FindType(type) is not null))
            {
                return;
            }

            if (allowed.Refused(symbol) is { } refused && !(refused is ITypeSymbol refusedType && banned.FindType(refusedType) is not null))
            {
                report(Diagnostic.Create(Descriptors.NotAllowed, location, refused is IDynamicTypeSymbol ? DynamicApi : refused.ToDisplayString()));
            }
        }
    }
}
