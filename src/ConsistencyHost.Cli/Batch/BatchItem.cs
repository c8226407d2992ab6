using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Cli.Batch;

/// <summary>
/// One entry of a batch as read from its source: a request to check, or the reason it could not be read
/// (then <see cref="Problem"/> is set and the entry is reported with an input error, never dropped).
/// </summary>
/// <param name="EntryId">The entry's id, or where it came from when the id could not be read.</param>
/// <param name="Source">Where it came from: a file name, or "FILE.sdf record N (line L)".</param>
/// <param name="Request">The request to check; null when the entry could not be read.</param>
/// <param name="Problem">Why the entry could not be read; null when it was.</param>
internal sealed record BatchItem(string EntryId, string Source, CheckEntryRequest? Request, InputError? Problem)
{
    public static BatchItem Read(CheckEntryRequest request, string source) => new(request.EntryId, source, request, null);

    public static BatchItem Unreadable(string entryId, string source, string reason) =>
        new(entryId, source, null, new InputError { Field = source, Reason = reason });
}
