using System.Reflection;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Plugins.Safety;
using ConsistencyHost.Engine.Vetting;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>
/// Finds rule plugins in a folder: every sub-folder is one plugin whose main assembly has the folder's
/// name (as <c>dotnet build</c> lays it out); a bare <c>.dll</c> in the folder itself is a plugin too, and
/// a sub-folder with <c>.cs</c> files but no such assembly is a source plugin, compiled by the host.
/// Every plugin is vetted against the SDK's banned list before anything of it is loaded. A plugin that is
/// refused or cannot be loaded is listed with its reason; it never stops the host. A plugin folder that others
/// than the host's user could change does stop it (<see cref="PluginFolderSafety"/>).
/// </summary>
public static class PluginDiscovery
{
    /// <summary>Discovers, vets and loads every plugin under <paramref name="pluginsPath"/>, ordered by rule id.</summary>
    /// <param name="pluginsPath">The plugin folder.</param>
    /// <param name="sourceCacheRoot">Where compiled source plugins are cached; default <see cref="SourcePluginCompiler.DefaultCacheRoot"/>.</param>
    /// <param name="untrusted">
    /// When workers are on: which plugins are trusted, and the executor that describes the others. Untrusted plugins
    /// are then vetted here through their metadata only and never loaded into the host. Null loads every plugin here.
    /// </param>
    /// <exception cref="Profiles.ProfileConfigurationException">The folder or a plugin in it is writable by others than the host's user.</exception>
    public static IReadOnlyList<RuleDescriptor> Discover(string pluginsPath, string? sourceCacheRoot = null, UntrustedPlugins? untrusted = null)
    {
        if (!Directory.Exists(pluginsPath))
        {
            return [];
        }

        var candidates = Candidates(pluginsPath).ToList();
        PluginFolderSafety.Demand(pluginsPath, candidates.Select(c => c.Root));
        // With workers on, source plugins compile in a worker process with time and memory limits (ISourceCompilation).
        var compiler = new SourcePluginCompiler(sourceCacheRoot ?? SourcePluginCompiler.DefaultCacheRoot, untrusted?.SourceCompilation);
        var found = new List<RuleDescriptor>();
        var described = new List<Task<IReadOnlyList<RuleDescriptor>>>();
        var unavailable = untrusted?.RefusalReason;
        foreach (var candidate in candidates)
        {
            if (unavailable is not null && candidate.SourceFolder is { } sourceFolder)
            {
                // A source plugin is never trusted: not even its compiler runs where workers cannot be isolated.
                found.Add(Refused(Path.GetFileName(sourceFolder) + SourceSuffix, unavailable, Path.GetFileName(sourceFolder)));
                continue;
            }

            var vetted = candidate.SourceFolder is { } folder ? CompileSource(folder, compiler) : VetCompiled(candidate.AssemblyPath!, candidate.Vetted);
            if (vetted.Refusal is null && unavailable is not null && !untrusted!.IsTrusted(vetted.Plugin))
            {
                found.Add(Refused(vetted.Plugin, unavailable));
            }
            else if (vetted.Refusal is { } refusal)
            {
                found.Add(refusal);
            }
            else if (untrusted is not null && !untrusted.IsTrusted(vetted.Plugin))
            {
                // Task.Run: no caller's synchronisation context is captured by the describe calls awaited below.
                described.Add(Task.Run(() => untrusted.DescribeAsync(vetted.AssemblyPath, vetted.Plugin)));
            }
            else
            {
                found.AddRange(LoadInHost(vetted.AssemblyPath, vetted.Plugin));
            }
        }

        foreach (var task in described)
        {
            found.AddRange(task.GetAwaiter().GetResult());
        }

        return RefuseDuplicateIds(found);
    }

    // Root: what the plugin is on disk (the bare assembly, or its sub-folder with everything under it).
    private sealed record Candidate(string Root, string? AssemblyPath, string? SourceFolder, IReadOnlyList<string> Vetted);

    private static IEnumerable<Candidate> Candidates(string pluginsPath)
    {
        foreach (var dll in Directory.EnumerateFiles(pluginsPath, "*.dll").Order(StringComparer.Ordinal))
        {
            yield return new Candidate(dll, dll, null, [dll]);
        }

        foreach (var folder in Directory.EnumerateDirectories(pluginsPath).Order(StringComparer.Ordinal))
        {
            var main = Path.Combine(folder, Path.GetFileName(folder) + ".dll");
            if (File.Exists(main))
            {
                // The plugin's own dependencies run in its context too, so they are vetted with it.
                yield return new Candidate(folder, main, null, [.. Directory.EnumerateFiles(folder, "*.dll", SearchOption.AllDirectories).Order(StringComparer.Ordinal)]);
            }
            else if (SourceFiles.IsSourcePlugin(folder))
            {
                yield return new Candidate(folder, null, folder, []);
            }
        }
    }

    /// <summary>A plugin that passed vetting (not yet loaded anywhere), or its refusal.</summary>
    private sealed record VettedPlugin(string AssemblyPath, string Plugin, RuleDescriptor? Refusal);

    private static VettedPlugin CompileSource(string folder, SourcePluginCompiler compiler)
    {
        var name = Path.GetFileName(folder);
        var plugin = name + SourceSuffix;
        SourcePluginResult result;
        try
        {
            // The compilation's own limits (time, and memory in a worker) turn an overrun into a refusal with its reason.
            result = compiler.Compile(folder);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            return new("", plugin, Refused(plugin, $"could not be read: {exception.Message}", name));
        }

        return result.IsAccepted
            ? VetCompiled(result.AssemblyPath!, [], plugin)
            : new("", plugin, Refused(plugin, "refused by source vetting: " + string.Join("; ", result.Problems), name));
    }

    /// <summary>
    /// Vets and loads one plugin assembly and every assembly in its folder, as discovery does for a folder;
    /// a worker process uses it to load the one plugin it serves.
    /// </summary>
    public static IReadOnlyList<RuleDescriptor> LoadAssembly(string assemblyPath)
    {
        var folder = Path.GetDirectoryName(Path.GetFullPath(assemblyPath))!;
        var vetted = VetCompiled(assemblyPath, [.. Directory.EnumerateFiles(folder, "*.dll", SearchOption.AllDirectories).Order(StringComparer.Ordinal)]);
        return vetted.Refusal is { } refusal ? [refusal] : LoadInHost(vetted.AssemblyPath, vetted.Plugin);
    }

    private static string? Vet(IReadOnlyList<string> assemblies)
    {
        foreach (var path in assemblies)
        {
            var result = CompiledPluginVetter.Default.Vet(path);
            if (!result.IsAccepted)
            {
                return $"refused by vetting of {Path.GetFileName(path)}: {result.Reason}";
            }
        }

        return null;
    }

    /// <summary>Checks the SDK version and vets through metadata and IL only: nothing of the plugin runs.</summary>
    private static VettedPlugin VetCompiled(string assemblyPath, IReadOnlyList<string> vetted, string? pluginName = null)
    {
        var plugin = pluginName ?? Path.GetFileName(assemblyPath);
        try
        {
            var refusal = SdkCompatibility.Check(assemblyPath) ?? Vet(vetted);
            return new(Path.GetFullPath(assemblyPath), plugin, refusal is null ? null : Refused(plugin, refusal));
        }
        catch (Exception exception) when (exception is BadImageFormatException or IOException or UnauthorizedAccessException)
        {
            return new("", plugin, Refused(plugin, $"could not be read: {exception.Message}"));
        }
    }

    /// <summary>Loads a vetted plugin into its own load context in this process and describes its rules.</summary>
    private static IReadOnlyList<RuleDescriptor> LoadInHost(string assemblyPath, string plugin)
    {
        try
        {
            var context = new PluginLoadContext(assemblyPath);
            var assembly = context.LoadFromAssemblyPath(assemblyPath);
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
            return Refused(plugin, $"CHSDK0001: rule class {type.FullName} has no [Rule] metadata", type.Name);
        }

        var problems = RuleMetadataValidator.Problems(metadata);
        if (problems.Count > 0)
        {
            return Refused(plugin, $"CHSDK0002: rule class {type.FullName}: " + string.Join("; ", problems), metadata.Id ?? type.Name);
        }

        if (type.GetConstructor(Type.EmptyTypes) is null)
        {
            return Refused(plugin, $"rule class {type.FullName} needs a public parameterless constructor", metadata.Id);
        }

        IRule probe;
        IReadOnlyList<RuleOptionInfo> schema;
        try
        {
            probe = (IRule)Activator.CreateInstance(type)!;
            schema = OptionText.Schema(probe.OptionsType);
        }
        catch (Exception exception) when (exception is TargetInvocationException or TypeInitializationException or MissingMethodException
                                              or MemberAccessException or ArgumentException or NotSupportedException)
        {
            var error = exception is TargetInvocationException { InnerException: { } inner } ? inner : exception;
            return Refused(plugin, $"rule class {type.FullName} could not be created: {error.GetType().Name}: {error.Message}", metadata.Id);
        }

        return new RuleDescriptor
        {
            Id = metadata.Id,
            Version = metadata.Version,
            Title = metadata.Title,
            Nuclei = metadata.Nuclei,
            Plugin = plugin,
            OptionsType = probe.OptionsType,
            OptionSchema = schema,
            FindingCodes = DeclaredCodes.Of(type.Assembly),
            AssemblyPath = type.Assembly.Location,
            Factory = () => (IRule)Activator.CreateInstance(type)!,
        };
    }

    private const string SourceSuffix = " (source)";

    private static RuleDescriptor Refused(string plugin, string reason, string? id = null) =>
        new() { Id = id ?? PluginName(plugin), Plugin = plugin, LoadMessage = reason };

    /// <summary>True for a plugin compiled by the host from a folder of sources: never trusted in-process.</summary>
    internal static bool IsSourcePlugin(string plugin) => plugin.EndsWith(SourceSuffix, StringComparison.Ordinal);

    /// <summary>"Lab.Rules.dll" → "Lab.Rules"; "Lab.Rules (source)" → "Lab.Rules".</summary>
    public static string PluginName(string plugin) =>
        plugin.EndsWith(SourceSuffix, StringComparison.Ordinal) ? plugin[..^SourceSuffix.Length] : Path.GetFileNameWithoutExtension(plugin);

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
