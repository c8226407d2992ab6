using System.Collections.Concurrent;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace ConsistencyHost.Sdk.Analyzers.Metadata;

/// <summary>
/// Rule classes carry well-formed [Rule] metadata (CHSDK0001, CHSDK0002) and no two rule classes of one
/// assembly share an id (CHSDK0003) — the checks the host repeats when it loads the plugin.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class RuleMetadataAnalyzer : DiagnosticAnalyzer
{
    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } =
        ImmutableArray.Create(Descriptors.MissingMetadata, Descriptors.MalformedMetadata, Descriptors.DuplicateRuleId);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.Analyze | GeneratedCodeAnalysisFlags.ReportDiagnostics);
        context.EnableConcurrentExecution();
        context.RegisterCompilationStartAction(Start);
    }

    private static void Start(CompilationStartAnalysisContext context)
    {
        if (SdkSymbols.For(context.Compilation) is not { } sdk)
        {
            return;
        }

        var ids = new ConcurrentBag<(string Id, INamedTypeSymbol Type)>();
        context.RegisterSymbolAction(c => CheckType(c, sdk, ids), SymbolKind.NamedType);
        context.RegisterCompilationEndAction(c => ReportDuplicates(c, ids));
    }

    private static void CheckType(SymbolAnalysisContext context, SdkSymbols sdk, ConcurrentBag<(string, INamedTypeSymbol)> ids)
    {
        var type = (INamedTypeSymbol)context.Symbol;
        if (!sdk.IsRuleClass(type))
        {
            return;
        }

        var attribute = type.GetAttributes().FirstOrDefault(a => SymbolEqualityComparer.Default.Equals(a.AttributeClass, sdk.RuleAttribute));
        if (attribute is null)
        {
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.MissingMetadata, type.Locations[0], type.Name));
            return;
        }

        var arguments = attribute.ConstructorArguments;
        var id = Text(arguments, 0);
        var location = attribute.ApplicationSyntaxReference?.GetSyntax(context.CancellationToken).GetLocation() ?? type.Locations[0];
        foreach (var problem in RuleMetadataFormat.Problems(id, Text(arguments, 1), Text(arguments, 2)))
        {
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.MalformedMetadata, location, type.Name, problem));
        }

        if (id is not null)
        {
            ids.Add((id, type));
        }
    }

    private static string? Text(ImmutableArray<TypedConstant> arguments, int index) =>
        index < arguments.Length ? arguments[index].Value as string : null;

    private static void ReportDuplicates(CompilationAnalysisContext context, ConcurrentBag<(string Id, INamedTypeSymbol Type)> ids)
    {
        foreach (var group in ids.GroupBy(pair => pair.Id, System.StringComparer.Ordinal).Where(g => g.Count() > 1))
        {
            // Report in a stable order so the first declaration by name keeps the id.
            var ordered = group.OrderBy(pair => pair.Type.ToDisplayString(), System.StringComparer.Ordinal).ToList();
            foreach (var (id, type) in ordered.Skip(1))
            {
                context.ReportDiagnostic(Diagnostic.Create(Descriptors.DuplicateRuleId, type.Locations[0],
                    id, type.ToDisplayString(), ordered[0].Type.ToDisplayString()));
            }
        }
    }
}
