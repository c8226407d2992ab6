using ConsistencyHost.Engine.Plugins;

namespace ConsistencyHost.Worker;

/// <summary>The one plugin this worker serves, vetted and loaded as the host's discovery does it.</summary>
/// <param name="All">Every rule class found, refused ones included, as the host would list them.</param>
/// <param name="Rules">The rules that can run, by id.</param>
/// <param name="Refusal">Why the plugin or some of its rule classes were refused; empty when all loaded.</param>
internal sealed record LoadedPlugin(IReadOnlyList<RuleDescriptor> All, IReadOnlyDictionary<string, RuleDescriptor> Rules, string Refusal)
{
    public static LoadedPlugin Load(string assemblyPath)
    {
        var descriptors = PluginDiscovery.LoadAssembly(assemblyPath);
        var loaded = descriptors.Where(d => d.IsLoaded).ToDictionary(d => d.Id, StringComparer.Ordinal);
        var refusal = string.Join("; ", descriptors.Where(d => !d.IsLoaded).Select(d => d.LoadMessage));
        return new LoadedPlugin(descriptors, loaded, refusal);
    }
}
