using System.Globalization;

namespace ConsistencyHost.Cli.Batch;

/// <summary>
/// The progress line on stderr: entries done, rate and estimated time left. On a terminal the line is
/// rewritten in place; into a file or pipe a line is written at every tenth of the batch and at the end.
/// </summary>
internal sealed class BatchProgress(TextWriter stderr, int total, TimeProvider time, bool inPlace)
{
    private readonly long _start = time.GetTimestamp();
    private int _done;

    public void Advance()
    {
        _done++;
        var step = Math.Max(1, total / 10);
        if (!inPlace && _done % step != 0 && _done != total) return;
        stderr.Write((inPlace ? "\r" : "") + Line() + (inPlace ? "" : "\n"));
    }

    public void Finish()
    {
        if (inPlace) stderr.Write("\r" + Line() + "\n");
    }

    private string Line()
    {
        var seconds = Math.Max(time.GetElapsedTime(_start).TotalSeconds, 1e-6);
        var rate = _done / seconds;
        var left = Math.Max(0, total - _done);
        var eta = rate > 0 ? TimeSpan.FromSeconds(Math.Round(left / rate)) : TimeSpan.Zero;
        return string.Create(CultureInfo.InvariantCulture, $"batch: {_done}/{total} entries, {rate:0.0} entries/s, ETA {eta:hh\\:mm\\:ss}");
    }
}
