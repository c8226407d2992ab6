using System.Linq;
using Microsoft.CodeAnalysis;

namespace ConsistencyHost.Sdk.Analyzers;

/// <summary>The SDK types the analyzers look for in one compilation; null when the compilation lacks the SDK.</summary>
internal sealed class SdkSymbols
{
    private SdkSymbols(Compilation compilation)
    {
        Rule = compilation.GetTypeByMetadataName("ConsistencyHost.Sdk.Rules.IRule")!;
        RuleBase = compilation.GetTypeByMetadataName("ConsistencyHost.Sdk.Rules.Rule`1");
        RuleAttribute = compilation.GetTypeByMetadataName("ConsistencyHost.Sdk.Rules.RuleAttribute");
        Finding = compilation.GetTypeByMetadataName("ConsistencyHost.Sdk.Findings.Finding");
        RuleOptions = compilation.GetTypeByMetadataName("ConsistencyHost.Sdk.Options.RuleOptions");
        CancellationToken = compilation.GetTypeByMetadataName("System.Threading.CancellationToken");
    }

    public INamedTypeSymbol Rule { get; }

    public INamedTypeSymbol? RuleBase { get; }

    public INamedTypeSymbol? RuleAttribute { get; }

    public INamedTypeSymbol? Finding { get; }

    public INamedTypeSymbol? RuleOptions { get; }

    public INamedTypeSymbol? CancellationToken { get; }

    /// <summary>
    /// Only compilations that reference the SDK are plugins; the analyzers stay silent elsewhere so that
    /// attaching them to a non-plugin project costs nothing.
    /// </summary>
    public static SdkSymbols? For(Compilation compilation) =>
        compilation.GetTypeByMetadataName("ConsistencyHost.Sdk.Rules.IRule") is null ? null : new SdkSymbols(compilation);

    /// <summary>True for a concrete class that implements IRule.</summary>
    public bool IsRuleClass(INamedTypeSymbol type) =>
        type is { TypeKind: TypeKind.Class, IsAbstract: false } &&
        type.AllInterfaces.Contains(Rule, SymbolEqualityComparer.Default);

    /// <summary>True when <paramref name="type"/> derives from RuleOptions.</summary>
    public bool IsOptionsType(INamedTypeSymbol type)
    {
        for (var current = type.BaseType; current is not null; current = current.BaseType)
        {
            if (SymbolEqualityComparer.Default.Equals(current, RuleOptions))
            {
                return true;
            }
        }

        return false;
    }
}
