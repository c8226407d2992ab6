using System.Collections.Immutable;
using System.Linq;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;

namespace ConsistencyHost.Sdk.Analyzers.Contract;

/// <summary>
/// A rule's Check (an override of Rule&lt;T&gt;.Check or an implementation of IRule.Check) that never refers
/// to its CancellationToken parameter (CHSDK3001): the host cancels at the deadline, and a rule that does
/// not look keeps a thread busy after it.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class CancellationTokenAnalyzer : DiagnosticAnalyzer
{
    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } = ImmutableArray.Create(Descriptors.CancellationIgnored);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterCompilationStartAction(start =>
        {
            if (SdkSymbols.For(start.Compilation) is { } sdk)
            {
                start.RegisterOperationBlockStartAction(block => StartBlock(block, sdk));
            }
        });
    }

    private static void StartBlock(OperationBlockStartAnalysisContext context, SdkSymbols sdk)
    {
        if (context.OwningSymbol is not IMethodSymbol method || !IsCheck(method, sdk) ||
            method.Parameters.FirstOrDefault(p => SymbolEqualityComparer.Default.Equals(p.Type, sdk.CancellationToken)) is not { } token)
        {
            return;
        }

        var used = 0;
        context.RegisterOperationAction(c =>
        {
            if (SymbolEqualityComparer.Default.Equals(((IParameterReferenceOperation)c.Operation).Parameter, token))
            {
                Interlocked.Exchange(ref used, 1);
            }
        }, OperationKind.ParameterReference);
        context.RegisterOperationBlockEndAction(c =>
        {
            if (Volatile.Read(ref used) == 0)
            {
                c.ReportDiagnostic(Diagnostic.Create(Descriptors.CancellationIgnored, token.Locations[0],
                    method.ContainingType.Name + "." + method.Name, token.Name));
            }
        });
    }

    private static bool IsCheck(IMethodSymbol method, SdkSymbols sdk)
    {
        if (method.Name != "Check" && method.ExplicitInterfaceImplementations.Length == 0)
        {
            return false;
        }

        for (var overridden = method.OverriddenMethod; overridden is not null; overridden = overridden.OverriddenMethod)
        {
            if (SymbolEqualityComparer.Default.Equals(overridden.ContainingType.OriginalDefinition, sdk.RuleBase))
            {
                return true;
            }
        }

        var interfaceCheck = sdk.Rule.GetMembers("Check").FirstOrDefault();
        return interfaceCheck is not null && !SymbolEqualityComparer.Default.Equals(method.ContainingType, sdk.RuleBase) &&
               SymbolEqualityComparer.Default.Equals(method.ContainingType.FindImplementationForInterfaceMember(interfaceCheck), method);
    }
}
