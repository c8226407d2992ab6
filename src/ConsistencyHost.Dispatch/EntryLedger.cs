using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Dispatch;

/// <summary>
/// Every entry id of one dispatch and whether it has been reported: refuses a duplicate id in the input, lets
/// only the first report of an id through, and completes <see cref="AllReported"/> once the input has ended
/// and every entry read has its report. Thread-safe; holds one small record per id for the whole dispatch.
/// </summary>
internal sealed class EntryLedger
{
    private readonly Lock _gate = new();
    private readonly Dictionary<string, Entry> _entries = new(StringComparer.Ordinal);
    private readonly TaskCompletionSource _allReported = new(TaskCreationOptions.RunContinuationsAsynchronously);
    private bool _inputEnded;
    private int _outstanding;

    /// <summary>Entries read from the input.</summary>
    public int Read { get; private set; }

    /// <summary>Reports claimed for delivery (one per entry).</summary>
    public int Reported { get; private set; }

    /// <summary>Second and later reports of an entry, held back.</summary>
    public int DuplicatesSuppressed { get; private set; }

    /// <summary>Completes when the input has ended and every entry read has been reported.</summary>
    public Task AllReported => _allReported.Task;

    /// <summary>Entries read whose report has not reached the caller's queue.</summary>
    public int Outstanding { get { lock (_gate) return _outstanding; } }

    /// <summary>Records an entry read from the input.</summary>
    /// <exception cref="ArgumentException">The entry has no id, or its id was read before.</exception>
    public void Register(CheckEntryRequest request)
    {
        lock (_gate)
        {
            var position = Read + 1;
            if (string.IsNullOrEmpty(request.EntryId))
            {
                throw new ArgumentException($"entry {position} of the input has no entry_id; reports are matched to entries by id");
            }

            if (_entries.TryGetValue(request.EntryId, out var first))
            {
                throw new ArgumentException($"entry id '{request.EntryId}' appears twice in the input (entries {first.Position} and {position}); ids must be unique because reports are matched by id");
            }

            _entries[request.EntryId] = new Entry(position);
            Read = position;
            _outstanding++;
        }
    }

    /// <summary>Claims a report for delivery: true when it is the entry's first (then call <see cref="Delivered"/>).</summary>
    /// <exception cref="InvalidOperationException">A report for an id that was never sent (a host fault).</exception>
    public bool TryReport(string entryId)
    {
        lock (_gate)
        {
            if (!_entries.TryGetValue(entryId, out var entry))
            {
                throw new InvalidOperationException($"a replica answered entry id '{entryId}', which was never sent");
            }

            if (entry.Reported)
            {
                DuplicatesSuppressed++;
                return false;
            }

            entry.Reported = true;
            Reported++;
            return true;
        }
    }

    /// <summary>A claimed report has reached the caller's queue; the dispatch may end once all have.</summary>
    public void Delivered()
    {
        lock (_gate)
        {
            _outstanding--;
            CompleteWhenDone();
        }
    }

    /// <summary>True when the entry's report has been let through.</summary>
    public bool IsReported(string entryId)
    {
        lock (_gate) return _entries.TryGetValue(entryId, out var entry) && entry.Reported;
    }

    /// <summary>The input has no more entries.</summary>
    public void EndInput()
    {
        lock (_gate)
        {
            _inputEnded = true;
            CompleteWhenDone();
        }
    }

    private void CompleteWhenDone()
    {
        if (_inputEnded && _outstanding == 0) _allReported.TrySetResult();
    }

    private sealed class Entry(int position)
    {
        public int Position { get; } = position;

        public bool Reported { get; set; }
    }
}
