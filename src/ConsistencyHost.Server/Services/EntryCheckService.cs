using System.Diagnostics;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Reports;
using Grpc.Core;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// The gRPC face of the engine. Findings are data; an unusable entry is INVALID_ARGUMENT in a unary call
/// (mapped by <see cref="InputErrorInterceptor"/>) and an <c>input_error</c> reply inside a stream, so that one
/// bad entry does not end a batch. Every entry is logged with its id, profile and timing (<see cref="CheckLog"/>).
/// </summary>
public sealed class EntryCheckService(CheckEngine engine, ILogger<EntryCheckService> logger) : EntryCheck.EntryCheckBase
{
    /// <inheritdoc />
    public override Task<CheckEntryResponse> CheckEntry(CheckEntryRequest request, ServerCallContext context) =>
        Task.FromResult(Check(request, context.CancellationToken));

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
                response = Check(request, context.CancellationToken);
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

    private CheckEntryResponse Check(CheckEntryRequest request, CancellationToken cancellationToken)
    {
        var started = Stopwatch.GetTimestamp();
        CheckReport report;
        try
        {
            report = engine.Check(SubmissionMapper.ToSubmission(request), cancellationToken);
        }
        catch (EntryInputException error)
        {
            CheckLog.EntryRefused(logger, request.EntryId, error.Field, error.Reason);
            throw;
        }

        var response = ReportMapper.ToResponse(report);
        Log(response, Stopwatch.GetElapsedTime(started).TotalMilliseconds);
        return response;
    }

    private void Log(CheckEntryResponse response, double elapsedMs)
    {
        foreach (var run in response.RuleRuns)
        {
            if (run.Status is Contract.V1.RuleRunStatus.Failed or Contract.V1.RuleRunStatus.TimedOut or Contract.V1.RuleRunStatus.Crashed or Contract.V1.RuleRunStatus.Quarantined)
            {
                CheckLog.RuleDidNotFinish(logger, response.EntryId, run.RuleId, run.Status.ToString(), run.ElapsedMs, run.Message);
            }
            else
            {
                CheckLog.RuleRan(logger, response.EntryId, run.RuleId, run.Status.ToString(), run.ElapsedMs, run.FindingCount);
            }
        }

        CheckLog.EntryChecked(logger, response.EntryId, response.Profile, response.Findings.Count, response.HighestSeverity.ToString(), elapsedMs);
    }
}
