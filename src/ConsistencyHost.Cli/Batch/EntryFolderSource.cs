using ConsistencyHost.Contract.V1;
using Google.Protobuf;

namespace ConsistencyHost.Cli.Batch;

/// <summary>
/// A folder of entry files, <c>*.json</c> in the proto JSON mapping of CheckEntryRequest (as <c>check</c>
/// reads), in ordinal file-name order. A file that is not such a request becomes an unreadable item.
/// </summary>
internal sealed class EntryFolderSource(string folder) : IBatchSource
{
    private readonly IReadOnlyList<string> _files = [.. Directory.EnumerateFiles(folder, "*.json").Order(StringComparer.Ordinal)];

    public int Count() => _files.Count;

    public IEnumerable<BatchItem> Read() => _files.Select(ReadFile);

    private static BatchItem ReadFile(string path)
    {
        var name = Path.GetFileName(path);
        var fallbackId = Path.GetFileNameWithoutExtension(path);
        try
        {
            var request = JsonParser.Default.Parse<CheckEntryRequest>(File.ReadAllText(path));
            if (request.EntryId.Length == 0) request.EntryId = fallbackId;
            return BatchItem.Read(request, name);
        }
        catch (InvalidProtocolBufferException error)
        {
            return BatchItem.Unreadable(fallbackId, name, "is not a check request in the proto JSON mapping: " + error.Message);
        }
        catch (InvalidJsonException error)
        {
            return BatchItem.Unreadable(fallbackId, name, "is not valid JSON: " + error.Message);
        }
        catch (IOException error)
        {
            return BatchItem.Unreadable(fallbackId, name, "cannot be read: " + error.Message);
        }
    }
}
