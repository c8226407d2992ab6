using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;

namespace ConsistencyHost.Sdk.Analyzers.Contract;

/// <summary>
/// <c>new Finding(code, severity, message)</c>: the code must be a non-empty constant (CHSDK3002) so that
/// profiles can override its severity by name, and the message must not be empty (CHSDK3003).
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class FindingArgumentsAnalyzer : DiagnosticAnalyzer
{
    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } =
        ImmutableArray.Create(Descriptors.FindingCode, Descriptors.FindingMessage);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterCompilationStartAction(start =>
        {
            if (SdkSymbols.For(start.Compilation) is { Finding: { } finding })
            {
                start.RegisterOperationAction(c => Check(c, finding), OperationKind.ObjectCreation);
            }
        });
    }

    private static void Check(OperationAnalysisContext context, INamedTypeSymbol finding)
    {
        var creation = (IObjectCreationOperation)context.Operation;
        if (!SymbolEqualityComparer.Default.Equals(creation.Type, finding))
        {
            return;
        }

        if (Argument(creation, "code") is { } code && CodeProblem(code.Value) is { } problem)
        {
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.FindingCode, code.Syntax.GetLocation(), problem));
        }

        if (Argument(creation, "message") is { } message && IsBlankConstant(message.Value))
        {
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.FindingMessage, message.Syntax.GetLocation()));
        }
    }

    private static IArgumentOperation? Argument(IObjectCreationOperation creation, string name) =>
        creation.Arguments.FirstOrDefault(a => a.Parameter?.Name == name);

    private static string? CodeProblem(IOperation value)
    {
        if (!value.ConstantValue.HasValue)
        {
            return $"'{value.Syntax}' is not a constant";
        }

        return IsBlankConstant(value) ? "is empty" : null;
    }

    private static bool IsBlankConstant(IOperation value) =>
        value.ConstantValue is { HasValue: true } constant && (constant.Value is not string text || text.Trim().Length == 0);
}
