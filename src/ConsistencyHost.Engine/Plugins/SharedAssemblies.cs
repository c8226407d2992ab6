using System.Reflection;
using System.Runtime.Loader;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>Decides which assemblies a plugin shares with the host instead of loading its own copy.</summary>
internal static class SharedAssemblies
{
    private static readonly string[] ContractNames =
    [
        "ConsistencyHost.Sdk",
        "ConsistencyHost.Spectra",
        "ConsistencyHost.Chemistry",
    ];

    /// <summary>
    /// The contract assemblies are always shared (type identity of <c>IRule</c> depends on it); anything the
    /// host has already loaded is shared too, so the framework is never duplicated.
    /// </summary>
    public static bool IsShared(AssemblyName name)
    {
        if (ContractNames.Contains(name.Name, StringComparer.Ordinal))
        {
            return true;
        }

        foreach (var loaded in AssemblyLoadContext.Default.Assemblies)
        {
            if (string.Equals(loaded.GetName().Name, name.Name, StringComparison.Ordinal))
            {
                return true;
            }
        }

        return false;
    }
}
