using ConsistencyHost.Contract.V1;
using Grpc.Net.Client;

namespace ConsistencyHost.Dispatch;

/// <summary>
/// Checks a stream of entries over several replicas of the host, balanced on the client side, with exactly one
/// report per entry even when a replica dies mid-batch.
/// </summary>
/// <remarks>
/// <para>Each replica gets one bidirectional <c>CheckEntries</c> stream with a bounded number of entries in flight;
/// whichever replica has a free slot takes the next entry, so a faster replica takes more (a pull-based,
/// least-outstanding balance rather than round robin). The dispatcher remembers which entries each stream has not
/// answered. When a stream fails (the replica died, the connection broke, the host refused the call), those
/// entries go back in the queue after a back-off and are sent to whichever replica is up; the failed replica is
/// marked down and probed again later.</para>
/// <para>Resending is safe because a check changes nothing on the host: the same entry gives the same report
/// (AIP-194, googleapis/aip, aip/general/0194.md, on retrying idempotent calls). Because a reply can race the
/// failure of its stream, reports are de-duplicated by entry id, which is why entry ids must be unique in the
/// input.</para>
/// </remarks>
public sealed class ReplicaDispatcher : IDisposable
{
    private readonly IReadOnlyList<GrpcChannel> _replicas;
    private readonly bool _ownsChannels;
    private readonly DispatchOptions _options;

    /// <summary>Uses channels the caller made and keeps owning (e.g. with its own handler or credentials).</summary>
    /// <exception cref="ArgumentException">No replica, or the same channel twice.</exception>
    public ReplicaDispatcher(IReadOnlyList<GrpcChannel> replicas, DispatchOptions? options = null)
        : this(replicas, options, ownsChannels: false)
    {
    }

    private ReplicaDispatcher(IReadOnlyList<GrpcChannel> replicas, DispatchOptions? options, bool ownsChannels)
    {
        if (replicas.Count == 0) throw new ArgumentException("a dispatch needs at least one replica", nameof(replicas));
        if (replicas.Distinct().Count() != replicas.Count) throw new ArgumentException("the same channel is listed twice", nameof(replicas));
        _options = options ?? DispatchOptions.Default;
        _options.Validate();
        _replicas = replicas;
        _ownsChannels = ownsChannels;
    }

    /// <summary>Opens one channel per address (e.g. http://10.0.0.5:5151) and disposes them with the dispatcher.</summary>
    /// <exception cref="ArgumentException">No address, or the same address twice.</exception>
    public static ReplicaDispatcher Connect(IEnumerable<Uri> addresses, DispatchOptions? options = null)
    {
        var list = addresses.ToList();
        var repeated = list.GroupBy(address => address).FirstOrDefault(group => group.Count() > 1);
        if (repeated is not null) throw new ArgumentException($"replica address {repeated.Key} is listed twice", nameof(addresses));
        return new ReplicaDispatcher([.. list.Select(address => GrpcChannel.ForAddress(address))], options, ownsChannels: true);
    }

    /// <summary>The replicas' addresses, in the order given.</summary>
    public IReadOnlyList<string> Targets => [.. _replicas.Select(channel => channel.Target)];

    /// <summary>
    /// Starts nothing yet: the returned run sends entries as it is enumerated, reading <paramref name="entries"/>
    /// lazily (a large batch never sits in memory; the ids do, one small record each).
    /// </summary>
    public DispatchRun Dispatch(IAsyncEnumerable<CheckEntryRequest> entries) => new(_replicas, entries, _options);

    /// <inheritdoc />
    public void Dispose()
    {
        if (!_ownsChannels) return;
        foreach (var channel in _replicas) channel.Dispose();
    }
}
