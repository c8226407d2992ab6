using ConsistencyHost.Engine.Plugins;

namespace ConsistencyHost.Worker;

/// <summary>The one plugin this worker serves, vetted and loaded as the host's discovery does it.</summary>
internal sealed record LoadedPlugin(IReadOnlyDictionary<string, RuleDescriptor> Rules, string Refusal)
{
    public static LoadedPlugin Load(string assemblyPath)
    {
        var descriptors = PluginDiscovery.LoadAssembly(assemblyPath);
        var loaded = descriptors.Where(d => d.IsLoaded).ToDictionary(d => d.Id, StringComparer.Ordinal);
        var refusal = string.Join("; ", descriptors.Where(d => !d.IsLoaded).Select(d => d.LoadMessage));
        return new LoadedPlugin(loaded, refusal);
    }
}
