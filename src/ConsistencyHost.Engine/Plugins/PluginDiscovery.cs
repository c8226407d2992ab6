using System.Reflection;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>
/// Finds rule plugins in a folder: every sub-folder is one plugin whose main assembly has the folder's
/// name (as <c>dotnet build</c> lays it out); a bare <c>.dll</c> in the folder itself is a plugin too.
/// A plugin that cannot be loaded is listed as refused with its reason; it never stops the host.
/// </summary>
public static class PluginDiscovery
{
    /// <summary>Discovers and loads every plugin under <paramref name="pluginsPath"/>, ordered by rule id.</summary>
    public static IReadOnlyList<RuleDescriptor> Discover(string pluginsPath)
    {
        if (!Directory.Exists(pluginsPath))
        {
            return [];
        }

        var found = new List<RuleDescriptor>();
        foreach (var assemblyPath in MainAssemblies(pluginsPath))
        {
            found.AddRange(LoadPlugin(assemblyPath));
        }

        return RefuseDuplicateIds(found);
    }

    private static IEnumerable<string> MainAssemblies(string pluginsPath)
    {
        foreach (var dll in Directory.EnumerateFiles(pluginsPath, "*.dll").Order(StringComparer.Ordinal))
        {
            yield return dll;
        }

        foreach (var folder in Directory.EnumerateDirectories(pluginsPath).Order(StringComparer.Ordinal))
        {
            var main = Path.Combine(folder, Path.GetFileName(folder) + ".dll");
            if (File.Exists(main))
            {
                yield return main;
            }
        }
    }

    private static IReadOnlyList<RuleDescriptor> LoadPlugin(string assemblyPath)
    {
        var plugin = Path.GetFileName(assemblyPath);
        try
        {
            var refusal = SdkCompatibility.Check(assemblyPath);
            if (refusal is not null)
            {
                return [Refused(plugin, refusal)];
            }

            var context = new PluginLoadContext(Path.GetFullPath(assemblyPath));
            var assembly = context.LoadFromAssemblyPath(Path.GetFullPath(assemblyPath));
            var rules = RuleTypes(assembly).Select(type => Describe(type, plugin)).ToList();
            return rules.Count > 0 ? rules : [Refused(plugin, "the assembly contains no public rule class")];
        }
        catch (Exception exception) when (exception is BadImageFormatException or FileLoadException
                                              or FileNotFoundException or ReflectionTypeLoadException)
        {
            return [Refused(plugin, $"could not be loaded: {exception.Message}")];
        }
    }

    private static IEnumerable<Type> RuleTypes(Assembly assembly) =>
        assembly.GetExportedTypes()
            .Where(type => type is { IsClass: true, IsAbstract: false } && typeof(IRule).IsAssignableFrom(type))
            .OrderBy(type => type.FullName, StringComparer.Ordinal);

    private static RuleDescriptor Describe(Type type, string plugin)
    {
        var metadata = type.GetCustomAttribute<RuleAttribute>();
        if (metadata is null)
        {
            return Refused(plugin, $"rule class {type.FullName} has no [Rule] metadata", type.Name);
        }

        var problems = RuleMetadataValidator.Problems(metadata);
        if (problems.Count > 0)
        {
            return Refused(plugin, $"rule class {type.FullName}: " + string.Join("; ", problems), metadata.Id ?? type.Name);
        }

        if (type.GetConstructor(Type.EmptyTypes) is null)
        {
            return Refused(plugin, $"rule class {type.FullName} needs a public parameterless constructor", metadata.Id);
        }

        var probe = (IRule)Activator.CreateInstance(type)!;
        return new RuleDescriptor
        {
            Id = metadata.Id,
            Version = metadata.Version,
            Title = metadata.Title,
            Nuclei = metadata.Nuclei,
            Plugin = plugin,
            OptionsType = probe.OptionsType,
            Factory = () => (IRule)Activator.CreateInstance(type)!,
        };
    }

    private static RuleDescriptor Refused(string plugin, string reason, string? id = null) =>
        new() { Id = id ?? Path.GetFileNameWithoutExtension(plugin), Plugin = plugin, LoadMessage = reason };

    private static IReadOnlyList<RuleDescriptor> RefuseDuplicateIds(List<RuleDescriptor> found)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var result = new List<RuleDescriptor>(found.Count);
        foreach (var rule in found)
        {
            if (rule.IsLoaded && !seen.Add(rule.Id))
            {
                result.Add(rule with { Factory = null, LoadMessage = $"rule id '{rule.Id}' is already provided by another plugin" });
                continue;
            }

            result.Add(rule);
        }

        return [.. result.OrderBy(rule => rule.Id, StringComparer.Ordinal).ThenBy(rule => rule.Plugin, StringComparer.Ordinal)];
    }
}
