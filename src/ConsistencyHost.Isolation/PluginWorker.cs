using System.Text.Json;
using ConsistencyHost.Contract.Mapping;
using CheckEntryRequest = ConsistencyHost.Contract.V1.CheckEntryRequest;
using ConsistencyHost.Contract.Worker.V1;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Engine.Running;
using Grpc.Core;

namespace ConsistencyHost.Isolation;

/// <summary>
/// The worker of one plugin: started on first use, one call at a time (an overrun kills the process, and
/// with it anything else it was doing), restarted on the next use after it dies. Every worker of the plugin runs
/// under the one uid the plugin was given on its first start, which no other plugin's worker shares.
/// </summary>
internal sealed class PluginWorker(string pluginAssembly, IsolationOptions options, CrashLedger ledger, WorkerUsers users) : IAsyncDisposable
{
    private readonly SemaphoreSlim _gate = new(1, 1);
    private WorkerProcess? _worker;
    private int? _uid;
    private bool _disposed;

    public async Task<ExecutorResult> RunAsync(ActiveRule rule, CheckEntryRequest entry, CancellationToken cancellationToken)
    {
        await _gate.WaitAsync(cancellationToken);
        try
        {
            ObjectDisposedException.ThrowIf(_disposed, this);
            if (ledger.QuarantineReason(pluginAssembly) is { } reason) return Result(RuleRunStatus.Quarantined, reason);
            WorkerProcess worker;
            try
            {
                worker = await EnsureStartedAsync(cancellationToken);
            }
            catch (WorkerStartException error)
            {
                ledger.Record(pluginAssembly, error.Message);
                return Result(RuleRunStatus.Crashed, error.Message);
            }

            return await CallAsync(worker, rule, entry, cancellationToken);
        }
        finally
        {
            _gate.Release();
        }
    }

    /// <summary>
    /// Starts the worker (it loads the plugin) and asks it to describe its rules; the worker stays up for the
    /// runs that follow. Throws <see cref="WorkerStartException"/> or <see cref="RpcException"/>; the caller turns
    /// either into a refusal.
    /// </summary>
    public async Task<DescribeResponse> DescribeAsync(DescribeRequest request, CancellationToken cancellationToken)
    {
        await _gate.WaitAsync(cancellationToken);
        try
        {
            ObjectDisposedException.ThrowIf(_disposed, this);
            var worker = await EnsureStartedAsync(cancellationToken);
            try
            {
                return await worker.Client.DescribeAsync(request, deadline: DateTime.UtcNow + options.DescribeTimeout, cancellationToken: cancellationToken);
            }
            catch (RpcException error)
            {
                var exit = await worker.ExitAsync(TimeSpan.FromSeconds(5));
                await StopWorkerAsync();
                throw new WorkerStartException(exit is not null ? $"its worker died while describing it: {exit}"
                    : error.StatusCode == StatusCode.DeadlineExceeded ? $"its worker did not describe it within {options.DescribeTimeout.TotalSeconds:0} s; the worker was killed"
                    : $"the describe call failed ({error.StatusCode}: {error.Status.Detail})");
            }
        }
        finally
        {
            _gate.Release();
        }
    }

    private async Task<WorkerProcess> EnsureStartedAsync(CancellationToken cancellationToken)
    {
        if (_worker is { HasExited: false } running) return running;
        await StopWorkerAsync();
        _uid ??= users.Next();
        _worker = await WorkerProcess.StartAsync(options, _uid.Value, pluginAssembly, cancellationToken);
        return _worker;
    }

    private async Task<ExecutorResult> CallAsync(WorkerProcess worker, ActiveRule rule, CheckEntryRequest entry, CancellationToken cancellationToken)
    {
        var request = new RunRuleRequest
        {
            RuleId = rule.Descriptor.Id,
            // A rule its worker described carries the JSON the worker bound; the host never had its options type.
            OptionsJson = rule.Options is BoundOptions bound ? bound.Json : JsonSerializer.Serialize(rule.Options, rule.Options.GetType()),
            Entry = entry,
            DeadlineMs = (int)Math.Clamp(rule.Deadline.TotalMilliseconds, 1, int.MaxValue),
        };
        var limit = rule.Deadline + options.DeadlineGrace;
        using var call = worker.Client.RunRuleAsync(request, deadline: DateTime.UtcNow + limit, cancellationToken: cancellationToken);
        var overrun = Task.Delay(limit, cancellationToken);
        var first = await Task.WhenAny(call.ResponseAsync, overrun);
        if (cancellationToken.IsCancellationRequested)
        {
            // The caller gave up: the rule may still be running in the worker, so it goes, uncounted.
            await StopWorkerAsync();
            return Result(RuleRunStatus.Failed, "the request was cancelled during the run");
        }

        if (first == overrun && !call.ResponseAsync.IsCompleted)
        {
            return await LoseAsync(RuleRunStatus.TimedOut, $"overran its deadline of {rule.Deadline.TotalMilliseconds:0} ms; its worker was killed");
        }

        try
        {
            var reply = await call.ResponseAsync;
            return reply.Ok ? Result(RuleRunStatus.Ok, "", [.. reply.Findings.Select(FindingMapper.FromWire)])
                : Result(reply.TimedOut ? RuleRunStatus.TimedOut : RuleRunStatus.Failed, reply.Message);
        }
        catch (RpcException error) when (error.StatusCode == StatusCode.DeadlineExceeded)
        {
            return await LoseAsync(RuleRunStatus.TimedOut, $"overran its deadline of {rule.Deadline.TotalMilliseconds:0} ms; its worker was killed");
        }
        catch (RpcException error) when (!cancellationToken.IsCancellationRequested)
        {
            var exit = await worker.ExitAsync(TimeSpan.FromSeconds(5));
            return exit is { KilledFromOutside: true }
                ? await KilledFromOutsideAsync(exit)
                : exit is not null
                ? await LoseAsync(RuleRunStatus.Crashed, $"its worker died during the run: {exit}")
                : await LoseAsync(RuleRunStatus.Failed, $"the worker call failed ({error.StatusCode}: {error.Status.Detail}); the worker was restarted");
        }
        catch (FormatException error)
        {
            return Result(RuleRunStatus.Failed, $"the worker returned a malformed finding: {error.Message}");
        }
    }

    /// <summary>The worker is gone or must go: kill it, count the loss, restart on next use.</summary>
    private async Task<ExecutorResult> LoseAsync(RuleRunStatus status, string message)
    {
        await StopWorkerAsync();
        ledger.Record(pluginAssembly, message);
        WorkerTelemetry.Restarted(pluginAssembly);
        return Result(status, message);
    }

    /// <summary>
    /// The worker was killed by a signal the host did not send (another process, or the kernel's out-of-memory
    /// killer): the run is lost, but the plugin is not blamed — the loss is not counted toward its quarantine, so
    /// another process cannot get a victim plugin quarantined by killing its workers. Restarted on next use.
    /// </summary>
    private async Task<ExecutorResult> KilledFromOutsideAsync(WorkerExit exit)
    {
        await StopWorkerAsync();
        WorkerTelemetry.Restarted(pluginAssembly);
        return Result(RuleRunStatus.Crashed, $"its {exit} during the run; not counted against the plugin");
    }

    private static ExecutorResult Result(RuleRunStatus status, string message, IReadOnlyList<Sdk.Findings.Finding>? findings = null) =>
        new(status, message, findings ?? []);

    private async Task StopWorkerAsync()
    {
        if (_worker is not null) await _worker.DisposeAsync();
        _worker = null;
    }

    /// <summary>Kills the worker; waits a little for a run in progress, then kills it anyway.</summary>
    public async ValueTask DisposeAsync()
    {
        var entered = await _gate.WaitAsync(TimeSpan.FromSeconds(10));
        try
        {
            _disposed = true;
            await StopWorkerAsync();
        }
        finally
        {
            if (entered) _gate.Release();
        }
    }
}
