using Microsoft.CodeAnalysis;

namespace ConsistencyHost.Sdk.Analyzers.Tests;

/// <summary>Finds namespaces in a compilation's references, for the tests that check the API lists' N: entries.</summary>
internal static class ReferenceNamespaces
{
    /// <summary>The namespace with this dotted name, or null when no reference declares it.</summary>
    public static INamespaceSymbol? Find(Compilation compilation, string name)
    {
        INamespaceSymbol? current = compilation.GlobalNamespace;
        foreach (var part in name.Split('.'))
        {
            current = current?.GetNamespaceMembers().FirstOrDefault(ns => ns.Name == part);
        }

        return current;
    }
}
