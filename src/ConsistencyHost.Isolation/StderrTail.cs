using System.Diagnostics;

namespace ConsistencyHost.Isolation;

/// <summary>
/// Keeps the last few lines a worker wrote to standard error, so that a crash can be reported with the
/// runtime's own words ("Stack overflow.", "Out of memory."). Reading also keeps the pipe from filling up.
/// </summary>
internal sealed class StderrTail
{
    private const int MaxLines = 6;
    private const int MaxLineLength = 300;
    private readonly Queue<string> _lines = new();
    private readonly Lock _lock = new();
    private readonly Task _reader;

    public StderrTail(Process process) => _reader = ReadAsync(process.StandardError);

    public Task DrainedAsync(TimeSpan limit) => _reader.WaitAsync(limit).ContinueWith(_ => { }, TaskScheduler.Default);

    /// <summary>"; last stderr: …" or empty.</summary>
    public string Describe()
    {
        lock (_lock)
        {
            return _lines.Count == 0 ? "" : "; last stderr: " + string.Join(" | ", _lines);
        }
    }

    /// <summary>Stack frames and the runtime's repeat markers would push the one useful line out.</summary>
    private static bool IsNoise(string line)
    {
        var trimmed = line.Trim();
        return trimmed.Length == 0 || trimmed.StartsWith("at ", StringComparison.Ordinal)
               || trimmed.StartsWith("---", StringComparison.Ordinal) || trimmed.StartsWith("Repeat ", StringComparison.Ordinal);
    }

    private async Task ReadAsync(StreamReader reader)
    {
        try
        {
            while (await reader.ReadLineAsync() is { } line)
            {
                if (IsNoise(line)) continue;
                lock (_lock)
                {
                    _lines.Enqueue(line.Length <= MaxLineLength ? line : line[..MaxLineLength] + "…");
                    if (_lines.Count > MaxLines) _lines.Dequeue();
                }
            }
        }
        catch (Exception error) when (error is IOException or ObjectDisposedException)
        {
            // The process is gone; what was read is kept.
        }
    }
}
