using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Cli.Batch;

/// <summary>Checks a stream of entries and yields one reply per entry, in order.</summary>
internal interface IBatchChecker
{
    IAsyncEnumerable<(BatchItem Item, CheckEntryResponse Response)> CheckAsync(IEnumerable<BatchItem> items, CancellationToken cancellationToken);
}
