using System.Runtime.CompilerServices;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Intake;

namespace ConsistencyHost.Cli.Batch;

/// <summary>Checks entries one by one with the embedded engine; an unusable entry becomes an input-error reply.</summary>
internal sealed class EmbeddedChecker(CheckEngine engine) : IBatchChecker
{
    public async IAsyncEnumerable<(BatchItem Item, CheckEntryResponse Response)> CheckAsync(
        IEnumerable<BatchItem> items, [EnumeratorCancellation] CancellationToken cancellationToken)
    {
        foreach (var item in items)
        {
            cancellationToken.ThrowIfCancellationRequested();
            yield return (item, Check(item, cancellationToken));
            await Task.Yield();
        }
    }

    private CheckEntryResponse Check(BatchItem item, CancellationToken cancellationToken)
    {
        if (item.Request is null) return ReportMapper.ToInputErrorResponse(item.EntryId, item.Problem!.Field, item.Problem.Reason);
        try
        {
            return ReportMapper.ToResponse(engine.Check(SubmissionMapper.ToSubmission(item.Request), cancellationToken));
        }
        catch (EntryInputException error)
        {
            return ReportMapper.ToInputErrorResponse(item.EntryId, error.Field, error.Reason);
        }
    }
}
