using System.Threading.Channels;
using ConsistencyHost.Contract.V1;
using Grpc.Core;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// The reading half of a CheckEntries stream: takes a slot, then reads one entry into the pending queue. The
/// queue holds as many entries as there are slots, so a write to it never waits; the wait is for the slot.
/// </summary>
internal static class EntryStreamReader
{
    public static async Task ReadAsync(
        IAsyncStreamReader<CheckEntryRequest> requests, ChannelWriter<CheckEntryRequest> pending, StreamSlots slots, CancellationToken cancellationToken)
    {
        try
        {
            while (true)
            {
                await slots.WaitAsync(cancellationToken);
                if (!await requests.MoveNext(cancellationToken))
                {
                    slots.Unused();
                    break;
                }

                slots.Entered();
                if (!pending.TryWrite(requests.Current))
                {
                    throw new InvalidOperationException("the pending queue is sized to the slots; a full queue means a slot was not taken");
                }
            }

            pending.TryComplete();
        }
        catch
        {
            // The entries already read are still answered; the writer then observes this task's error.
            pending.TryComplete();
            throw;
        }
    }
}
