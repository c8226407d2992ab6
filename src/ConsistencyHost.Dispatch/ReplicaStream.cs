using ConsistencyHost.Contract.V1;
using Grpc.Core;

namespace ConsistencyHost.Dispatch;

/// <summary>
/// One bidirectional <c>CheckEntries</c> call to one replica: a sender takes entries from the shared queue while
/// fewer than <see cref="DispatchOptions.MaxInFlightPerReplica"/> are unanswered, a receiver matches replies by
/// entry id. Returns when <c>finished</c> fires and the replica has answered what it was sent; throws when the
/// call fails, leaving the unanswered entries in <see cref="Unanswered"/>.
/// </summary>
internal sealed class ReplicaStream(EntryCheck.EntryCheckClient client, ILaneHub hub)
{
    private readonly SemaphoreSlim _slots = new(hub.Options.MaxInFlightPerReplica);
    private int _sent;
    private int _reported;

    public InFlightSet Unanswered { get; } = new();

    public int Sent => _sent;

    public int Reported => _reported;

    public async Task RunAsync(CancellationToken finished, CancellationToken abort)
    {
        using var stop = CancellationTokenSource.CreateLinkedTokenSource(abort);
        using var call = client.CheckEntries(cancellationToken: stop.Token);
        var sending = SendAsync(call.RequestStream, finished, stop.Token);
        var receiving = ReceiveAsync(call.ResponseStream, stop.Token);
        var first = await Task.WhenAny(sending, receiving);
        if (first == sending && first.IsCompletedSuccessfully)
        {
            await receiving;
            return;
        }

        // The receiver ended first (the replica closed the stream) or a side failed: stop the other side, report why.
        await stop.CancelAsync();
        await Task.WhenAll(sending, receiving).ContinueWith(_ => { }, TaskScheduler.Default);
        abort.ThrowIfCancellationRequested();
        await first;
        throw new RpcException(new Status(StatusCode.Unavailable, "the replica ended the stream while entries were unanswered"));
    }

    private async Task SendAsync(IClientStreamWriter<CheckEntryRequest> requests, CancellationToken finished, CancellationToken stop)
    {
        using var taking = CancellationTokenSource.CreateLinkedTokenSource(finished, stop);
        try
        {
            while (true)
            {
                await _slots.WaitAsync(taking.Token);
                var item = await hub.Queue.ReadAsync(taking.Token);
                if (hub.Ledger.IsReported(item.EntryId))
                {
                    _slots.Release(); // a resubmitted copy whose first send was answered after all
                    continue;
                }

                Unanswered.Add(item with { Sends = item.Sends + 1 });
                Interlocked.Increment(ref _sent);
                await requests.WriteAsync(item.Request);
            }
        }
        catch (OperationCanceledException) when (finished.IsCancellationRequested && !stop.IsCancellationRequested)
        {
            await requests.CompleteAsync();
        }
    }

    private async Task ReceiveAsync(IAsyncStreamReader<CheckEntryResponse> replies, CancellationToken stop)
    {
        while (await replies.MoveNext(stop))
        {
            var reply = replies.Current;
            if (Unanswered.Remove(reply.EntryId)) _slots.Release();
            bool first;
            try
            {
                first = hub.Ledger.TryReport(reply.EntryId);
            }
            catch (InvalidOperationException error)
            {
                hub.Fail(error); // a reply for an id never sent is a host fault, not something a retry can mend
                throw;
            }

            if (!first) continue;
            Interlocked.Increment(ref _reported);
            await hub.DeliverAsync(reply);
        }
    }
}
