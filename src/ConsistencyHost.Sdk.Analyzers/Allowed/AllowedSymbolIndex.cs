using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace ConsistencyHost.Sdk.Analyzers.Allowed;

/// <summary>
/// The allow-list resolved against one compilation. A symbol is allowed when it is the plugin's own, listed
/// itself, a member of a listed type (or of a type nested in one), in a listed namespace, or a type one of
/// whose members is listed (the type may be named, only the listed members used). Type arguments count too:
/// <c>List&lt;FileStream&gt;</c> is refused for <c>FileStream</c>.
/// </summary>
internal sealed class AllowedSymbolIndex
{
    private readonly HashSet<ISymbol> _types = new(SymbolEqualityComparer.Default);
    private readonly HashSet<ISymbol> _members = new(SymbolEqualityComparer.Default);
    private readonly HashSet<ISymbol> _namedThroughMember = new(SymbolEqualityComparer.Default);
    private readonly HashSet<string> _namespaces = new(System.StringComparer.Ordinal);
    private readonly IAssemblySymbol _own;

    public AllowedSymbolIndex(Compilation compilation, AllowedApiList list)
    {
        _own = compilation.Assembly;
        foreach (var id in list.DocumentationIds)
        {
            if (id[0] == 'N')
            {
                _namespaces.Add(id.Substring(2));
                continue;
            }

            foreach (var symbol in DocumentationCommentId.GetSymbolsForDeclarationId(id, compilation))
            {
                if (symbol is INamedTypeSymbol)
                {
                    _types.Add(symbol);
                }
                else
                {
                    _members.Add(symbol);
                    _namedThroughMember.Add(symbol.ContainingType);
                }
            }
        }
    }

    /// <summary>The symbol that keeps <paramref name="symbol"/> off the list (itself or a type argument), or null when it is allowed.</summary>
    public ISymbol? Refused(ISymbol? symbol)
    {
        switch (symbol)
        {
            case null:
            case ITypeParameterSymbol:
                return null;
            case IArrayTypeSymbol array:
                return Refused(array.ElementType);
            case IPointerTypeSymbol pointer:
                return Refused(pointer.PointedAtType);
            case IDynamicTypeSymbol or IFunctionPointerTypeSymbol:
                return symbol;
            case INamedTypeSymbol type:
                return AllowsType(type) ? TypeArgumentRefused(type) : symbol;
        }

        var definition = symbol is IMethodSymbol method ? (method.ReducedFrom ?? method).OriginalDefinition : symbol.OriginalDefinition;
        if (!IsOwn(definition) && !_members.Contains(definition) &&
            !(definition is IMethodSymbol { AssociatedSymbol: { } owner } && _members.Contains(owner.OriginalDefinition)) &&
            !ListsType(definition.ContainingType))
        {
            return symbol;
        }

        return TypeArgumentRefused(symbol.ContainingType) ??
               (symbol is IMethodSymbol generic ? FirstRefused(generic.TypeArguments) : null);
    }

    private bool AllowsType(INamedTypeSymbol type)
    {
        var definition = type.OriginalDefinition;
        return ListsType(definition) || _namedThroughMember.Contains(definition);
    }

    /// <summary>True for the plugin's own types, listed types, types nested in listed ones and types of listed namespaces.</summary>
    private bool ListsType(INamedTypeSymbol? type)
    {
        var outermost = type?.OriginalDefinition;
        for (var current = outermost; current is not null; current = current.ContainingType)
        {
            if (IsOwn(current) || _types.Contains(current))
            {
                return true;
            }

            outermost = current;
        }

        for (var ns = outermost?.ContainingNamespace; ns is { IsGlobalNamespace: false }; ns = ns.ContainingNamespace)
        {
            if (_namespaces.Contains(ns.ToDisplayString()))
            {
                return true;
            }
        }

        return false;
    }

    private ISymbol? TypeArgumentRefused(INamedTypeSymbol? type)
    {
        for (var current = type; current is not null; current = current.ContainingType)
        {
            if (FirstRefused(current.TypeArguments) is { } refused)
            {
                return refused;
            }
        }

        return null;
    }

    private ISymbol? FirstRefused(IEnumerable<ITypeSymbol> types)
    {
        foreach (var type in types)
        {
            if (Refused(type) is { } refused)
            {
                return refused;
            }
        }

        return null;
    }

    private bool IsOwn(ISymbol symbol) => SymbolEqualityComparer.Default.Equals(symbol.ContainingAssembly, _own);
}
