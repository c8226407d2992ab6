namespace ConsistencyHost.Server.Services;

/// <summary>
/// The in-flight slots of one CheckEntries stream. The reader waits for a slot before it reads the next entry
/// (<see cref="WaitAsync"/>, then <see cref="Entered"/> or <see cref="Unused"/>); the writer frees it once the
/// reply is written (<see cref="Answered"/>). Entries still held when the stream ends leave the count on dispose.
/// </summary>
public sealed class StreamSlots : IDisposable
{
    private readonly StreamInFlight _host;
    private readonly SemaphoreSlim _free;
    private int _held;

    internal StreamSlots(StreamInFlight host)
    {
        _host = host;
        _free = new SemaphoreSlim(host.LimitPerStream, host.LimitPerStream);
    }

    /// <summary>Waits until this stream holds fewer than the limit.</summary>
    public Task WaitAsync(CancellationToken cancellationToken) => _free.WaitAsync(cancellationToken);

    /// <summary>An entry was read into the slot just taken.</summary>
    public void Entered() => _host.Entered(Interlocked.Increment(ref _held));

    /// <summary>The slot just taken was not used (the stream had ended).</summary>
    public void Unused() => _free.Release();

    /// <summary>An entry's reply was written: its slot is free.</summary>
    public void Answered()
    {
        Interlocked.Decrement(ref _held);
        _host.Left(1, answered: true);
        _free.Release();
    }

    /// <inheritdoc />
    public void Dispose()
    {
        var left = Interlocked.Exchange(ref _held, 0);
        if (left > 0) _host.Left(left, answered: false);
        _free.Dispose();
    }
}
