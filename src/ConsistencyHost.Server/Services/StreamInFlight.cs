namespace ConsistencyHost.Server.Services;

/// <summary>
/// Entries of CheckEntries streams that the host has read and not yet answered, host-wide, with the highest
/// count any one stream reached. A stream takes a slot before it reads an entry and gives it back once the
/// reply is written, so no stream ever holds more than <see cref="LimitPerStream"/> entries: a client that
/// stops reading its replies stops the host reading its requests, and HTTP/2 flow control stops the client.
/// </summary>
public sealed class StreamInFlight(int limitPerStream)
{
    private int _current;
    private int _peakPerStream;
    private long _read;
    private long _answered;

    /// <summary>The most entries one stream holds at once (ServerOptions.MaxEntriesInFlightPerStream).</summary>
    public int LimitPerStream { get; } = limitPerStream;

    /// <summary>Entries read and not yet answered, over all open streams.</summary>
    public int Current => Volatile.Read(ref _current);

    /// <summary>The highest in-flight count one stream has reached since the host started.</summary>
    public int PeakPerStream => Volatile.Read(ref _peakPerStream);

    /// <summary>Entries read from all streams since the host started.</summary>
    public long Read => Interlocked.Read(ref _read);

    /// <summary>Replies written to all streams since the host started.</summary>
    public long Answered => Interlocked.Read(ref _answered);

    /// <summary>Slots for one stream; dispose when the stream ends.</summary>
    public StreamSlots Open() => new(this);

    internal void Entered(int streamCount)
    {
        Interlocked.Increment(ref _current);
        Interlocked.Increment(ref _read);
        for (var peak = PeakPerStream; streamCount > peak; peak = PeakPerStream)
        {
            Interlocked.CompareExchange(ref _peakPerStream, streamCount, peak);
        }
    }

    internal void Left(int entries, bool answered)
    {
        Interlocked.Add(ref _current, -entries);
        if (answered) Interlocked.Add(ref _answered, entries);
    }
}
