using System.Diagnostics;
using System.Threading.Channels;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Server.Hosting;
using Grpc.Core;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// The gRPC face of the engine. Findings are data; an unusable entry is INVALID_ARGUMENT in a unary call
/// (mapped by <see cref="InputErrorInterceptor"/>) and an <c>input_error</c> reply inside a stream, so that one
/// bad entry does not end a batch. Every entry is logged with its id, the call's request id, profile and timing
/// (<see cref="CheckLog"/>); every reply carries the call's request id (<see cref="RequestIds"/>).
/// </summary>
public sealed class EntryCheckService(CheckEngine engine, StreamInFlight inFlight, ILogger<EntryCheckService> logger) : EntryCheck.EntryCheckBase
{
    /// <inheritdoc />
    public override Task<CheckEntryResponse> CheckEntry(CheckEntryRequest request, ServerCallContext context) =>
        Task.FromResult(Check(request, RequestIds.Of(context), context.CancellationToken));

    /// <inheritdoc />
    /// <remarks>
    /// A reader takes entries off the request stream only while this stream holds fewer than
    /// <see cref="StreamInFlight.LimitPerStream"/> unanswered ones; entries are checked and answered in order.
    /// A client that does not read its replies blocks the reply writes, the reader stops, HTTP/2 flow control
    /// stops the client's writes, and the host holds at most the limit (plus the transport's fixed windows).
    /// </remarks>
    public override async Task CheckEntries(
        IAsyncStreamReader<CheckEntryRequest> requestStream,
        IServerStreamWriter<CheckEntryResponse> responseStream,
        ServerCallContext context)
    {
        using var slots = inFlight.Open();
        using var stop = CancellationTokenSource.CreateLinkedTokenSource(context.CancellationToken);
        var pending = Channel.CreateBounded<CheckEntryRequest>(new BoundedChannelOptions(inFlight.LimitPerStream) { SingleReader = true, SingleWriter = true });
        var requestId = RequestIds.Of(context);
        var reading = EntryStreamReader.ReadAsync(requestStream, pending.Writer, slots, stop.Token);
        try
        {
            await foreach (var request in pending.Reader.ReadAllAsync(context.CancellationToken))
            {
                await responseStream.WriteAsync(CheckInStream(request, requestId, context.CancellationToken), context.CancellationToken);
                slots.Answered();
            }
        }
        catch
        {
            await stop.CancelAsync();
            await reading.ConfigureAwait(ConfigureAwaitOptions.SuppressThrowing);
            throw;
        }

        await reading;
    }

    /// <inheritdoc />
    public override Task<ListRulesResponse> ListRules(ListRulesRequest request, ServerCallContext context)
    {
        var list = ReportMapper.ToRuleList(engine);
        list.HostVersion = ServerApp.Version;
        return Task.FromResult(list);
    }

    /// <inheritdoc />
    public override Task<ListProfilesResponse> ListProfiles(ListProfilesRequest request, ServerCallContext context) =>
        Task.FromResult(ProfileMapper.ToProfileList(engine));

    private CheckEntryResponse CheckInStream(CheckEntryRequest request, string requestId, CancellationToken cancellationToken)
    {
        try
        {
            return Check(request, requestId, cancellationToken);
        }
        catch (EntryInputException error)
        {
            var response = ReportMapper.ToInputErrorResponse(request.EntryId, error.Field, error.Reason);
            response.RequestId = requestId;
            return response;
        }
    }

    private CheckEntryResponse Check(CheckEntryRequest request, string requestId, CancellationToken cancellationToken)
    {
        var started = Stopwatch.GetTimestamp();
        CheckReport report;
        try
        {
            report = engine.Check(SubmissionMapper.ToSubmission(request) with { RequestId = requestId }, cancellationToken);
        }
        catch (EntryInputException error)
        {
            CheckLog.EntryRefused(logger, request.EntryId, requestId, error.Field, error.Reason);
            throw;
        }

        var response = ReportMapper.ToResponse(report);
        response.RequestId = requestId;
        Log(response, Stopwatch.GetElapsedTime(started).TotalMilliseconds);
        return response;
    }

    private void Log(CheckEntryResponse response, double elapsedMs)
    {
        foreach (var run in response.RuleRuns)
        {
            if (run.Status is Contract.V1.RuleRunStatus.Failed or Contract.V1.RuleRunStatus.TimedOut or Contract.V1.RuleRunStatus.Crashed or Contract.V1.RuleRunStatus.Quarantined)
            {
                CheckLog.RuleDidNotFinish(logger, response.EntryId, response.RequestId, run.RuleId, run.Status.ToString(), run.ElapsedMs, run.Message);
            }
            else
            {
                CheckLog.RuleRan(logger, response.EntryId, run.RuleId, run.Status.ToString(), run.ElapsedMs, run.FindingCount);
            }
        }

        CheckLog.EntryChecked(logger, response.EntryId, response.RequestId, response.Profile, response.Findings.Count, response.HighestSeverity.ToString(), elapsedMs);
    }
}
