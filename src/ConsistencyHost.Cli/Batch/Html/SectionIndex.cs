namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>
/// Where each entry's HTML section lies in the sections scratch file, kept in a second scratch file (fixed
/// 24-byte records, input order) rather than in memory, so that memory does not grow with the batch. In memory
/// stays one count per distinct key (rank, errors, warnings): a handful for a real notebook. The page is put
/// together key by key, worst first, each key by one pass over the index, so entries of equal key keep input order.
/// </summary>
internal sealed class SectionIndex : IDisposable
{
    private const int RecordBytes = 24;
    private readonly FileStream _file;
    private readonly BinaryWriter _writer;
    private readonly SortedDictionary<SectionKey, int> _counts = [];

    public SectionIndex(string path)
    {
        _file = new FileStream(path, FileMode.Create, FileAccess.ReadWrite, FileShare.None, 1 << 16, FileOptions.DeleteOnClose);
        _writer = new BinaryWriter(_file);
    }

    public int Entries { get; private set; }

    /// <summary>Entries per key, worst key first.</summary>
    public IReadOnlyDictionary<SectionKey, int> Counts => _counts;

    public void Add(SectionKey key, long offset, int length)
    {
        _writer.Write(key.Rank);
        _writer.Write(key.Errors);
        _writer.Write(key.Warnings);
        _writer.Write(length);
        _writer.Write(offset);
        _counts[key] = _counts.GetValueOrDefault(key) + 1;
        Entries++;
    }

    /// <summary>Offset and length of every section, worst key first, input order within a key.</summary>
    public IEnumerable<(long Offset, int Length)> WorstFirst()
    {
        _writer.Flush();
        foreach (var key in _counts.Keys)
        {
            _file.Position = 0;
            using var reader = new BinaryReader(new BufferedStream(_file, 1 << 16), System.Text.Encoding.UTF8, leaveOpen: true);
            for (var i = 0; i < Entries; i++)
            {
                var read = new SectionKey(reader.ReadInt32(), reader.ReadInt32(), reader.ReadInt32());
                var length = reader.ReadInt32();
                var offset = reader.ReadInt64();
                if (read == key) yield return (offset, length);
            }
        }
    }

    public void Dispose()
    {
        _writer.Dispose();
        _file.Dispose();
    }
}
