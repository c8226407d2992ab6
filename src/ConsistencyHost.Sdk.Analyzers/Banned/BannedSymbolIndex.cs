using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace ConsistencyHost.Sdk.Analyzers.Banned;

/// <summary>
/// The banned list resolved against one compilation: members and types as symbols, namespaces by name.
/// Lookup goes from the most specific entry to the least (member, type and its containers, namespace).
/// </summary>
internal sealed class BannedSymbolIndex
{
    private readonly Dictionary<ISymbol, BannedApiEntry> _symbols = new(SymbolEqualityComparer.Default);
    private readonly Dictionary<string, BannedApiEntry> _namespaces = new(System.StringComparer.Ordinal);
    private readonly Dictionary<string, BannedApiEntry> _byId = new(System.StringComparer.Ordinal);

    public BannedSymbolIndex(Compilation compilation, BannedApiList list)
    {
        foreach (var entry in list.Entries)
        {
            _byId[entry.DocumentationId] = entry;
            if (entry.Kind == 'N')
            {
                _namespaces[entry.Name] = entry;
                continue;
            }

            foreach (var symbol in DocumentationCommentId.GetSymbolsForDeclarationId(entry.DocumentationId, compilation))
            {
                _symbols[symbol] = entry;
            }
        }
    }

    /// <summary>The entry with exactly this documentation id, or null when the list has none.</summary>
    public BannedApiEntry? ById(string documentationId) => _byId.TryGetValue(documentationId, out var entry) ? entry : null;

    /// <summary>The entry that bans <paramref name="symbol"/>, or null.</summary>
    public BannedApiEntry? Find(ISymbol? symbol)
    {
        if (symbol is null)
        {
            return null;
        }

        var definition = Definition(symbol);
        if (definition.Kind != SymbolKind.NamedType && _symbols.TryGetValue(definition, out var member))
        {
            return member;
        }

        // A property's accessor (a method group, an explicit get_ call) is banned with its property.
        if (definition is IMethodSymbol { AssociatedSymbol: IPropertySymbol property } && _symbols.TryGetValue(property.OriginalDefinition, out var owner))
        {
            return owner;
        }

        var type = definition as INamedTypeSymbol ?? definition.ContainingType;
        return FindType(type) ?? FindNamespace(definition.ContainingNamespace ?? type?.ContainingNamespace);
    }

    /// <summary>The entry that bans a type (or a type it is nested in, or its namespace), or null.</summary>
    public BannedApiEntry? FindType(ITypeSymbol? type)
    {
        for (var current = type?.OriginalDefinition; current is not null; current = current.ContainingType)
        {
            if (_symbols.TryGetValue(current, out var entry))
            {
                return entry;
            }
        }

        return type is null ? null : FindNamespace(type.ContainingNamespace);
    }

    private BannedApiEntry? FindNamespace(INamespaceSymbol? ns)
    {
        for (var current = ns; current is { IsGlobalNamespace: false }; current = current.ContainingNamespace)
        {
            if (_namespaces.TryGetValue(current.ToDisplayString(), out var entry))
            {
                return entry;
            }
        }

        return null;
    }

    private static ISymbol Definition(ISymbol symbol) => symbol switch
    {
        IMethodSymbol method => (method.ReducedFrom ?? method).OriginalDefinition,
        _ => symbol.OriginalDefinition,
    };
}
