namespace ConsistencyHost.StreamBench.Streaming;

/// <summary>Counts the newline-terminated lines of a file that another process is appending to.</summary>
internal sealed class LineCounter(string path)
{
    private readonly byte[] _buffer = new byte[1 << 16];
    private long _offset;
    private int _lines;

    public int Count()
    {
        if (!File.Exists(path)) return _lines;
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete);
        if (stream.Length < _offset) (_offset, _lines) = (0, 0); // the file was started again
        stream.Position = _offset;
        for (int read; (read = stream.Read(_buffer, 0, _buffer.Length)) > 0; _offset += read)
        {
            _lines += _buffer.AsSpan(0, read).Count((byte)'\n');
        }

        return _lines;
    }
}
