using System.Runtime.CompilerServices;
using System.Threading.Channels;
using ConsistencyHost.Contract.V1;
using Grpc.Core;
using Grpc.Net.Client;

namespace ConsistencyHost.Dispatch;

/// <summary>
/// One dispatch of a stream of entries: enumerate it (once) for the reports, in completion order, one per entry;
/// then read <see cref="Summary"/>. Enumeration throws <see cref="ArgumentException"/> at a duplicate or missing
/// entry id in the input, and <see cref="RpcException"/> (UNAVAILABLE) when an entry stays unanswered after
/// <see cref="DispatchOptions.MaxAttempts"/> sends or every replica has been given up; reports delivered before
/// stand. Breaking out of the loop cancels the dispatch.
/// </summary>
public sealed class DispatchRun : IAsyncEnumerable<CheckEntryResponse>, ILaneHub
{
    private readonly IAsyncEnumerable<CheckEntryRequest> _entries;
    private readonly ReplicaLane[] _lanes;
    private readonly Channel<WorkItem> _queue;
    private readonly Channel<CheckEntryResponse> _reports;
    private readonly TaskCompletionSource<Exception> _failed = new(TaskCreationOptions.RunContinuationsAsynchronously);
    private readonly CancellationTokenSource _finished = new();
    private CancellationTokenSource _abort = null!; // made in ReadAsync, linked to the caller's token
    private DispatchSummary? _summary;
    private int _resubmitted;
    private int _givenUp;
    private int _enumerated;

    internal DispatchRun(IReadOnlyList<GrpcChannel> replicas, IAsyncEnumerable<CheckEntryRequest> entries, DispatchOptions options)
    {
        Options = options;
        _entries = entries;
        _lanes = [.. replicas.Select(channel => new ReplicaLane(channel, this))];
        _queue = Channel.CreateBounded<WorkItem>(replicas.Count);
        _reports = Channel.CreateBounded<CheckEntryResponse>(replicas.Count * options.MaxInFlightPerReplica);
    }

    /// <summary>The dispatch's figures; set when the enumeration has ended (completely or with an error).</summary>
    /// <exception cref="InvalidOperationException">Read before the enumeration ended.</exception>
    public DispatchSummary Summary => _summary ?? throw new InvalidOperationException("the summary is ready once the reports have been enumerated to the end");

    /// <inheritdoc cref="ILaneHub.Options" />
    public DispatchOptions Options { get; }

    EntryLedger ILaneHub.Ledger => Ledger;

    ChannelReader<WorkItem> ILaneHub.Queue => _queue.Reader;

    private EntryLedger Ledger { get; } = new();

    /// <inheritdoc />
    public IAsyncEnumerator<CheckEntryResponse> GetAsyncEnumerator(CancellationToken cancellationToken = default) =>
        Interlocked.Exchange(ref _enumerated, 1) == 0
            ? ReadAsync(cancellationToken).GetAsyncEnumerator(cancellationToken)
            : throw new InvalidOperationException("a dispatch can be enumerated once; start another with ReplicaDispatcher.Dispatch");

    private async IAsyncEnumerable<CheckEntryResponse> ReadAsync([EnumeratorCancellation] CancellationToken cancellationToken)
    {
        _abort = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        var supervising = SuperviseAsync();
        try
        {
            await foreach (var report in _reports.Reader.ReadAllAsync(CancellationToken.None)) yield return report;
        }
        finally
        {
            await _abort.CancelAsync();
            await supervising;
            _abort.Dispose();
            _finished.Dispose();
        }
    }

    private async Task SuperviseAsync()
    {
        var started = Options.TimeProvider.GetTimestamp();
        var feeding = FeedAsync();
        var lanes = Task.WhenAll(_lanes.Select(lane => lane.RunAsync(_finished.Token, _abort.Token)));
        var ended = await Task.WhenAny(Ledger.AllReported, _failed.Task, Task.Delay(Timeout.Infinite, _abort.Token));
        if (ended == Ledger.AllReported)
        {
            // Let each stream close gracefully (the replica answers any copy still on it), but not for ever.
            await _finished.CancelAsync();
            await Task.WhenAny(lanes, Task.Delay(Options.ProbeTimeout, Options.TimeProvider));
        }

        await _abort.CancelAsync();
        await Task.WhenAll(feeding, lanes).ContinueWith(_ => { }, TaskScheduler.Default);
        _summary = Summarise(Options.TimeProvider.GetElapsedTime(started));
        Exception? error = ended == _failed.Task ? _failed.Task.Result : ended == Ledger.AllReported ? null : new OperationCanceledException(_abort.Token);
        _reports.Writer.TryComplete(error);
    }

    private async Task FeedAsync()
    {
        try
        {
            await foreach (var request in _entries.WithCancellation(_abort.Token))
            {
                Ledger.Register(request);
                await _queue.Writer.WriteAsync(new WorkItem(request, Sends: 0), _abort.Token);
            }

            Ledger.EndInput();
        }
        catch (OperationCanceledException) when (_abort.IsCancellationRequested)
        {
        }
        catch (Exception error)
        {
            ((ILaneHub)this).Fail(error); // a bad input id, or the caller's own enumeration failing
        }
    }

    private DispatchSummary Summarise(TimeSpan elapsed)
    {
        var replicas = _lanes.Select(lane => lane.Tally()).ToList();
        return new DispatchSummary(Ledger.Read, Ledger.Reported, Volatile.Read(ref _resubmitted), Ledger.DuplicatesSuppressed,
            replicas.Count(replica => replica.Failures > 0), elapsed, replicas);
    }

    async ValueTask ILaneHub.DeliverAsync(CheckEntryResponse response)
    {
        await _reports.Writer.WriteAsync(response, _abort.Token);
        Ledger.Delivered();
    }

    void ILaneHub.Resubmit(IReadOnlyList<WorkItem> unanswered, Exception cause)
    {
        foreach (var item in unanswered.Where(item => !Ledger.IsReported(item.EntryId)))
        {
            if (item.Sends >= Options.MaxAttempts)
            {
                ((ILaneHub)this).Fail(new RpcException(new Status(StatusCode.Unavailable,
                    $"entry '{item.EntryId}' was sent {item.Sends} times and no replica answered it; last failure: {cause.Message}", cause)));
                return;
            }

            Interlocked.Increment(ref _resubmitted);
            _ = RequeueAsync(item, Options.Backoff(item.Sends));
        }
    }

    void ILaneHub.ReplicaGivenUp(string target, Exception cause)
    {
        if (Interlocked.Increment(ref _givenUp) < _lanes.Length) return;
        ((ILaneHub)this).Fail(new RpcException(new Status(StatusCode.Unavailable,
            $"all {_lanes.Length} replicas failed {Options.MaxReplicaFailures} times in a row with {Ledger.Outstanding} entries unanswered; last ({target}): {cause.Message}", cause)));
    }

    void ILaneHub.Fail(Exception error) => _failed.TrySetResult(error);

    private async Task RequeueAsync(WorkItem item, TimeSpan delay)
    {
        try
        {
            await Task.Delay(delay, Options.TimeProvider, _abort.Token);
            await _queue.Writer.WriteAsync(item, _abort.Token);
        }
        catch (OperationCanceledException)
        {
            // The dispatch ended; the ledger decides what was answered.
        }
    }
}
