using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Running;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>
/// How discovery treats untrusted plugins when workers are on: vetted in the host through their metadata, then
/// described by a worker (metadata, option schema, each profile's options bound and validated), never loaded
/// into the host, so that a hostile static constructor, constructor or options <c>Validate</c> runs only there.
/// </summary>
/// <param name="isTrusted">True for a plugin name (assembly name without ".dll") trusted in-process.</param>
/// <param name="executor">Starts the workers that describe and later run untrusted plugins.</param>
/// <param name="profiles">The profiles whose options each worker binds.</param>
public sealed class UntrustedPlugins(Func<string, bool> isTrusted, IRuleExecutor executor, IReadOnlyList<Profile> profiles)
{
    /// <summary>Workers started at once; each start is a .NET process start, mostly CPU.</summary>
    private readonly SemaphoreSlim _starts = new(Math.Max(2, Environment.ProcessorCount));

    /// <summary>Where source plugins compile: the executor's bounded place (a worker process), or null for in-process.</summary>
    internal Vetting.ISourceCompilation? SourceCompilation => executor.SourceCompilation;

    /// <summary>
    /// Why untrusted plugins cannot run here at all (<see cref="IRuleExecutor.UnavailableReason"/>), or null. Each is
    /// then refused with it — never loaded in the host, never run less isolated.
    /// </summary>
    internal string? RefusalReason => executor.UnavailableReason is { } reason
        ? $"untrusted plugins run only in isolated workers, and this host cannot start them: {reason}; the plugin was not run"
        : null;

    /// <summary>True when the plugin loads in the host; a source plugin never does.</summary>
    internal bool IsTrusted(string plugin) => !PluginDiscovery.IsSourcePlugin(plugin) && isTrusted(PluginDiscovery.PluginName(plugin));

    /// <summary>The plugin's rules as its worker describes them; a failure is one refused descriptor with the reason.</summary>
    internal async Task<IReadOnlyList<RuleDescriptor>> DescribeAsync(string assemblyPath, string plugin)
    {
        await _starts.WaitAsync().ConfigureAwait(false);
        try
        {
            return await executor.DescribeAsync(assemblyPath, plugin, profiles, CancellationToken.None).ConfigureAwait(false);
        }
        catch (Exception error) when (error is not OutOfMemoryException)
        {
            // The executor promises a refusal rather than an exception; a broken promise must not stop the host either.
            return [new RuleDescriptor { Id = PluginDiscovery.PluginName(plugin), Plugin = plugin, LoadMessage = $"could not be described by its worker: {error.Message}" }];
        }
        finally
        {
            _starts.Release();
        }
    }
}
