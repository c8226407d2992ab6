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
/// order with a single host, unreadable items included). Unreadable items are not sent; their input-error reply
/// is made here.
/// </summary>
internal sealed class RemoteChecker(ReplicaDispatcher dispatcher) : IBatchChecker
{
    /// <summary>The dispatch's figures, once <see cref="CheckAsync"/> has been enumerated to the end.</summary>
    public DispatchSummary? Summary { get; private set; }

    public async IAsyncEnumerable<(BatchItem Item, CheckEntryResponse Response)> CheckAsync(
        IEnumerable<BatchItem> items, [EnumeratorCancellation] CancellationToken cancellationToken)
    {
        var waiting = new ConcurrentDictionary<string, (BatchItem Item, int Position)>(StringComparer.Ordinal);
        var unreadable = new ConcurrentQueue<(BatchItem Item, int Position)>();
        // One host answers in input order, and so must the reports: an unreadable item is known as soon as the
        // dispatcher reads past it, so it waits here for the entries before it.
        var order = new InputOrder(inOrder: dispatcher.Targets.Count == 1);
        var run = dispatcher.Dispatch(Sendable(items, waiting, unreadable).ToAsyncEnumerable());
        await using (var reports = run.GetAsyncEnumerator(cancellationToken))
        {
            while (await NextAsync(reports))
            {
                while (unreadable.TryDequeue(out var bad)) order.Add(bad.Position, bad.Item, InputError(bad.Item));
                var response = reports.Current;
                var (item, position) = waiting.TryRemove(response.EntryId, out var found)
                    ? found
                    : throw new InvalidOperationException($"the dispatcher reported entry '{response.EntryId}', which is not waiting");
                order.Add(position, item, response);
                foreach (var ready in order.Ready()) yield return ready;
            }
        }

        while (unreadable.TryDequeue(out var bad)) order.Add(bad.Position, bad.Item, InputError(bad.Item));
        foreach (var ready in order.Ready()) yield return ready;
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
        IEnumerable<BatchItem> items, ConcurrentDictionary<string, (BatchItem, int)> waiting, ConcurrentQueue<(BatchItem, int)> unreadable)
    {
        var position = 0;
        foreach (var item in items)
        {
            if (item.Request is null)
            {
                unreadable.Enqueue((item, position++));
                continue;
            }

            waiting[item.Request.EntryId] = (item, position++);
            yield return item.Request;
        }
    }

    private static CheckEntryResponse InputError(BatchItem item) =>
        ReportMapper.ToInputErrorResponse(item.EntryId, item.Problem!.Field, item.Problem.Reason);
}
