using System.Collections.Concurrent;
using System.Runtime.CompilerServices;
using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Dispatch;

namespace ConsistencyHost.Cli.Batch;

/// <summary>
/// Checks entries on one or more running hosts through <see cref="ReplicaDispatcher"/>: one CheckEntries stream
/// per host, entries resubmitted elsewhere when a host is lost, one report per entry in completion order (input
/// order with a single host). Unreadable items are not sent; their input-error reply is made here.
/// </summary>
internal sealed class RemoteChecker(ReplicaDispatcher dispatcher) : IBatchChecker
{
    /// <summary>The dispatch's figures, once <see cref="CheckAsync"/> has been enumerated to the end.</summary>
    public DispatchSummary? Summary { get; private set; }

    public async IAsyncEnumerable<(BatchItem Item, CheckEntryResponse Response)> CheckAsync(
        IEnumerable<BatchItem> items, [EnumeratorCancellation] CancellationToken cancellationToken)
    {
        var waiting = new ConcurrentDictionary<string, BatchItem>(StringComparer.Ordinal);
        var unreadable = new ConcurrentQueue<BatchItem>();
        var run = dispatcher.Dispatch(Sendable(items, waiting, unreadable).ToAsyncEnumerable());
        await using (var reports = run.GetAsyncEnumerator(cancellationToken))
        {
            while (await NextAsync(reports))
            {
                while (unreadable.TryDequeue(out var bad)) yield return (bad, InputError(bad));
                var response = reports.Current;
                yield return waiting.TryRemove(response.EntryId, out var item)
                    ? (item, response)
                    : throw new InvalidOperationException($"the dispatcher reported entry '{response.EntryId}', which is not waiting");
            }
        }

        while (unreadable.TryDequeue(out var bad)) yield return (bad, InputError(bad));
        Summary = run.Summary;
    }

    private static async Task<bool> NextAsync(IAsyncEnumerator<CheckEntryResponse> reports)
    {
        try
        {
            return await reports.MoveNextAsync();
        }
        catch (ArgumentException error)
        {
            throw new UsageException($"with --server {error.Message}");
        }
    }

    private static IEnumerable<CheckEntryRequest> Sendable(
        IEnumerable<BatchItem> items, ConcurrentDictionary<string, BatchItem> waiting, ConcurrentQueue<BatchItem> unreadable)
    {
        foreach (var item in items)
        {
            if (item.Request is null)
            {
                unreadable.Enqueue(item);
                continue;
            }

            waiting[item.Request.EntryId] = item;
            yield return item.Request;
        }
    }

    private static CheckEntryResponse InputError(BatchItem item) =>
        ReportMapper.ToInputErrorResponse(item.EntryId, item.Problem!.Field, item.Problem.Reason);
}
