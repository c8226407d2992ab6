using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Intake;
using Grpc.Core;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// The gRPC face of the engine. Findings are data; an unusable entry is INVALID_ARGUMENT in a unary call
/// (mapped by <see cref="InputErrorInterceptor"/>) and an <c>input_error</c> reply inside a stream, so that one
/// bad entry does not end a batch.
/// </summary>
public sealed class EntryCheckService(CheckEngine engine) : EntryCheck.EntryCheckBase
{
    /// <inheritdoc />
    public override Task<CheckEntryResponse> CheckEntry(CheckEntryRequest request, ServerCallContext context)
    {
        var report = engine.Check(SubmissionMapper.ToSubmission(request), context.CancellationToken);
        return Task.FromResult(ReportMapper.ToResponse(report));
    }

    /// <inheritdoc />
    /// <remarks>
    /// One entry is read, checked and answered before the next is read, so a slow reader applies
    /// back-pressure through HTTP/2 flow control and the host never buffers the batch.
    /// </remarks>
    public override async Task CheckEntries(
        IAsyncStreamReader<CheckEntryRequest> requestStream,
        IServerStreamWriter<CheckEntryResponse> responseStream,
        ServerCallContext context)
    {
        await foreach (var request in requestStream.ReadAllAsync(context.CancellationToken))
        {
            CheckEntryResponse response;
            try
            {
                response = ReportMapper.ToResponse(engine.Check(SubmissionMapper.ToSubmission(request), context.CancellationToken));
            }
            catch (EntryInputException error)
            {
                response = ReportMapper.ToInputErrorResponse(request.EntryId, error.Field, error.Reason);
            }

            await responseStream.WriteAsync(response, context.CancellationToken);
        }
    }

    /// <inheritdoc />
    public override Task<ListRulesResponse> ListRules(ListRulesRequest request, ServerCallContext context) =>
        Task.FromResult(ReportMapper.ToRuleList(engine));
}
