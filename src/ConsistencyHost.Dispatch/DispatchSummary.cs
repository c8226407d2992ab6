namespace ConsistencyHost.Dispatch;

/// <summary>What one dispatch did, available once its reports have all been read.</summary>
/// <param name="Sent">Entries read from the input (each counted once, however often it was sent).</param>
/// <param name="Reported">Reports delivered to the caller: equal to <paramref name="Sent"/> after a complete dispatch.</param>
/// <param name="Resubmitted">Sends of an entry after the first, because the replica it was on failed.</param>
/// <param name="DuplicatesSuppressed">Second reports of an entry (a reply racing its stream's failure) that were held back.</param>
/// <param name="ReplicasLost">Replicas whose stream failed at least once.</param>
/// <param name="Elapsed">From the start of the enumeration to the last report and the streams' close.</param>
/// <param name="Replicas">Per replica, in the order given.</param>
public sealed record DispatchSummary(
    int Sent, int Reported, int Resubmitted, int DuplicatesSuppressed, int ReplicasLost, TimeSpan Elapsed, IReadOnlyList<ReplicaTally> Replicas)
{
    /// <summary>One line for a log or a terminal.</summary>
    public override string ToString() =>
        $"{Sent} entries sent, {Reported} reported, {Resubmitted} resubmitted, {DuplicatesSuppressed} duplicates suppressed, " +
        $"{ReplicasLost} of {Replicas.Count} replicas lost, {Elapsed.TotalSeconds:0.0} s";
}

/// <summary>What one replica did in a dispatch.</summary>
/// <param name="Target">The replica's address.</param>
/// <param name="Sent">Requests written to its streams (resubmissions included).</param>
/// <param name="Reported">Reports it gave that were delivered (first of their entry).</param>
/// <param name="Failures">Streams or probes that failed.</param>
/// <param name="GivenUp">True when it failed <see cref="DispatchOptions.MaxReplicaFailures"/> times in a row and was no longer probed.</param>
public sealed record ReplicaTally(string Target, int Sent, int Reported, int Failures, bool GivenUp);
