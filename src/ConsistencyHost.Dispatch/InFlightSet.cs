namespace ConsistencyHost.Dispatch;

/// <summary>
/// The entries sent on one stream and not yet answered. When the stream fails, <see cref="TakeAll"/> hands
/// them back for resubmission; a reply that races with the failure may then also arrive, which is why the
/// ledger, not this set, decides whether a report is delivered.
/// </summary>
internal sealed class InFlightSet
{
    private readonly Lock _gate = new();
    private readonly Dictionary<string, WorkItem> _items = new(StringComparer.Ordinal);

    public void Add(WorkItem item)
    {
        lock (_gate) _items[item.EntryId] = item;
    }

    /// <summary>Removes an answered entry; false when it was not (or no longer) in flight here.</summary>
    public bool Remove(string entryId)
    {
        lock (_gate) return _items.Remove(entryId);
    }

    /// <summary>Empties the set and returns what it held.</summary>
    public IReadOnlyList<WorkItem> TakeAll()
    {
        lock (_gate)
        {
            var items = _items.Values.ToList();
            _items.Clear();
            return items;
        }
    }
}
