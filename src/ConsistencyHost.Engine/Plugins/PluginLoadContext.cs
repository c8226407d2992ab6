using System.Reflection;
using System.Runtime.Loader;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>
/// One load context per plugin so that plugins may carry their own dependency versions. Assemblies the host
/// already has (the SDK, the chemistry and spectra libraries, the framework) are shared from the default
/// context, so a plugin's <c>IRule</c> is the host's <c>IRule</c>.
/// </summary>
/// <remarks>
/// This isolates dependencies, not trust: .NET has no in-process sandbox, and a hostile plugin can still
/// harm the process. Untrusted plugins belong in a worker process.
/// </remarks>
internal sealed class PluginLoadContext(string mainAssemblyPath)
    : AssemblyLoadContext(name: Path.GetFileNameWithoutExtension(mainAssemblyPath), isCollectible: false)
{
    private readonly AssemblyDependencyResolver _resolver = new(mainAssemblyPath);

    protected override Assembly? Load(AssemblyName assemblyName)
    {
        if (SharedAssemblies.IsShared(assemblyName))
        {
            return null;
        }

        var path = _resolver.ResolveAssemblyToPath(assemblyName);
        return path is null ? null : LoadFromAssemblyPath(path);
    }

    protected override IntPtr LoadUnmanagedDll(string unmanagedDllName)
    {
        var path = _resolver.ResolveUnmanagedDllToPath(unmanagedDllName);
        return path is null ? IntPtr.Zero : LoadUnmanagedDllFromPath(path);
    }
}
