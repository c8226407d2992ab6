using System.Collections.Concurrent;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Running;
using ConsistencyHost.Engine.Vetting;

namespace ConsistencyHost.Isolation;

/// <summary>
/// Runs untrusted rules in worker processes, one worker per plugin assembly, and quarantines a plugin whose
/// workers keep dying. Disposing it kills every worker (workers also exit by themselves when the host's end
/// of their standard input closes, which covers a host that is killed outright).
/// </summary>
public sealed class WorkerRuleExecutor : IRuleExecutor, IAsyncDisposable, IDisposable
{
    private readonly IsolationOptions _options;
    private readonly CrashLedger _ledger;
    private readonly ConcurrentDictionary<string, PluginWorker> _workers = new(StringComparer.Ordinal);
    private readonly WorkerSourceCompiler _compiler;
    private readonly WorkerUsers _users;

    /// <summary>Creates the executor; workers start on first use.</summary>
    public WorkerRuleExecutor(IsolationOptions? options = null)
    {
        _options = options ?? new IsolationOptions();
        _ledger = new CrashLedger(_options);
        _users = new WorkerUsers(_options.WorkerUids);
        _compiler = new WorkerSourceCompiler(_options, _users);
        if (!File.Exists(_options.WorkerAssemblyPath))
        {
            throw new FileNotFoundException($"the rule worker is not at '{_options.WorkerAssemblyPath}'; build src/ConsistencyHost.Worker", _options.WorkerAssemblyPath);
        }
    }

    /// <summary>True when workers run without network (a fresh network namespace could be created here).</summary>
    public bool NetworkIsolated => _options.IsolateNetwork && NetworkNamespace.Arguments is not null;

    /// <summary>True when workers see the file system read-only except their private folder (a mount namespace could be set up here).</summary>
    public bool FileSystemReadOnly => _options.ReadOnlyFileSystem && ReadOnlyView.Available;

    /// <inheritdoc />
    /// <remarks>Set when this host cannot run each worker under a uid of its own (<see cref="WorkerUsers"/>).</remarks>
    public string? UnavailableReason => _users.UnavailableReason;

    /// <inheritdoc />
    public TimeSpan Overhead => _options.StartTimeout * 2 + _options.DeadlineGrace + TimeSpan.FromSeconds(15);

    /// <inheritdoc />
    public Task<ExecutorResult> RunAsync(ActiveRule rule, EntrySubmission submission, CancellationToken cancellationToken)
    {
        var worker = _workers.GetOrAdd(rule.Descriptor.AssemblyPath, path => new PluginWorker(path, _options, _ledger, _users));
        return worker.RunAsync(rule, RequestMapper.ToRequest(submission), cancellationToken);
    }

    /// <inheritdoc />
    public async Task<IReadOnlyList<RuleDescriptor>> DescribeAsync(string assemblyPath, string plugin, IReadOnlyList<Profile> profiles, CancellationToken cancellationToken)
    {
        var worker = _workers.GetOrAdd(assemblyPath, path => new PluginWorker(path, _options, _ledger, _users));
        try
        {
            var response = await worker.DescribeAsync(WorkerDescriptions.Request(profiles), cancellationToken);
            return WorkerDescriptions.Rules(response, assemblyPath, plugin, profiles);
        }
        catch (WorkerStartException error)
        {
            return [WorkerDescriptions.Refused(plugin, $"could not be described by its worker: {error.Message}")];
        }
    }

    /// <inheritdoc />
    /// <remarks>A one-shot worker process per source plugin, with <see cref="IsolationOptions.CompileTimeout"/> and <see cref="IsolationOptions.CompileHeapBytes"/>.</remarks>
    public ISourceCompilation SourceCompilation => _compiler;

    /// <inheritdoc />
    public string? HeldBackReason(RuleDescriptor rule) => _ledger.QuarantineReason(rule.AssemblyPath);

    /// <inheritdoc />
    /// <remarks>Counted like a worker loss: a plugin that keeps flooding reports is quarantined.</remarks>
    public void ReportOverLimit(RuleDescriptor rule, string reason) => _ledger.Record(rule.AssemblyPath, reason);

    /// <inheritdoc />
    public async ValueTask DisposeAsync()
    {
        foreach (var worker in _workers.Values)
        {
            await worker.DisposeAsync();
        }

        _workers.Clear();
    }

    /// <inheritdoc />
    public void Dispose() => DisposeAsync().AsTask().GetAwaiter().GetResult();
}
