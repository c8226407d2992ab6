using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Cli.Batch;

/// <summary>
/// Releases reports in input position order when asked to (holding a report until every earlier one is in), or as
/// they come otherwise.
/// </summary>
internal sealed class InputOrder(bool inOrder)
{
    private readonly SortedDictionary<int, (BatchItem Item, CheckEntryResponse Response)> _held = [];
    private readonly Queue<(BatchItem Item, CheckEntryResponse Response)> _ready = new();
    private int _next;

    public void Add(int position, BatchItem item, CheckEntryResponse response)
    {
        if (!inOrder)
        {
            _ready.Enqueue((item, response));
            return;
        }

        _held[position] = (item, response);
        while (_held.Remove(_next, out var report))
        {
            _ready.Enqueue(report);
            _next++;
        }
    }

    /// <summary>The reports that may be written now.</summary>
    public IEnumerable<(BatchItem Item, CheckEntryResponse Response)> Ready()
    {
        while (_ready.TryDequeue(out var report)) yield return report;
    }
}
