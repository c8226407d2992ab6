using System.Threading.Channels;
using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Dispatch;

/// <summary>What a replica's lane needs from the dispatch it belongs to.</summary>
internal interface ILaneHub
{
    DispatchOptions Options { get; }

    EntryLedger Ledger { get; }

    /// <summary>Entries waiting for a replica: fresh ones from the input and resubmitted ones.</summary>
    ChannelReader<WorkItem> Queue { get; }

    /// <summary>Hands a first report to the caller; waits while the caller is behind.</summary>
    ValueTask DeliverAsync(CheckEntryResponse response);

    /// <summary>Puts a failed stream's unanswered entries back in the queue, after a back-off.</summary>
    void Resubmit(IReadOnlyList<WorkItem> unanswered, Exception cause);

    /// <summary>A replica failed too often in a row and is no longer used.</summary>
    void ReplicaGivenUp(string target, Exception cause);

    /// <summary>Ends the dispatch with an error the caller sees.</summary>
    void Fail(Exception error);
}
