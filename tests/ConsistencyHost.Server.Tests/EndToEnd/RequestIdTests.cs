using System.Collections.Concurrent;
using System.Diagnostics;
using System.Net;
using System.Text;
using System.Text.Json;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Telemetry;
using ConsistencyHost.Server.Hosting;
using Google.Protobuf;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// x-request-id through the real host on loopback: a client's id (or one the host makes) comes back in the
/// response header, the reply's request_id, the per-entry log line and the check's trace span, on both ports.
/// </summary>
public sealed class RequestIdTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);
    private static readonly string[] Rules = ["ConsistencyHost.Rules.SpectrumMetadata"];

    [Fact]
    public async Task CheckEntry_ClientSendsId_EchoedInHeaderReplyLogAndSpan()
    {
        using var spans = new CheckSpans();
        await using var host = await RunningHost.StartAsync(Rules);
        var id = "eln-batch-7f3a/0001";

        using var call = new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(
            Requests.MissingSolvent("AIS-LQ-R001"), new Metadata { { RequestIds.Header, id } }, DateTime.UtcNow + CallTimeout);
        var reply = await call.ResponseAsync;

        Assert.Equal(id, reply.RequestId);
        Assert.Equal(id, (await call.ResponseHeadersAsync).GetValue(RequestIds.Header));
        var line = Assert.Single(host.Log.Lines, l => l.EventId == 1100 && (string?)l.Fields["EntryId"] == "AIS-LQ-R001");
        Assert.Equal(id, line.Fields["RequestId"]);
        Assert.Contains($"(request {id})", line.Text, StringComparison.Ordinal);
        var span = Assert.Single(spans.Of("AIS-LQ-R001"));
        Assert.Equal(id, span.GetTagItem(TelemetryNames.RequestIdTag));
    }

    [Fact]
    public async Task CheckEntry_NoIdSent_HostMakesOneAndEchoesIt()
    {
        await using var host = await RunningHost.StartAsync(Rules);

        using var call = new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(Requests.Complete("AIS-LQ-R002"), deadline: DateTime.UtcNow + CallTimeout);
        var reply = await call.ResponseAsync;

        Assert.Matches("^[0-9a-f]{32}$", reply.RequestId);
        Assert.Equal(reply.RequestId, (await call.ResponseHeadersAsync).GetValue(RequestIds.Header));
        Assert.Equal(reply.RequestId, host.Log.Lines.Single(l => l.EventId == 1100 && (string?)l.Fields["EntryId"] == "AIS-LQ-R002").Fields["RequestId"]);
    }

    [Fact]
    public async Task CheckEntries_EveryReplyOfTheStreamCarriesTheCallsId()
    {
        await using var host = await RunningHost.StartAsync(Rules);
        var id = "stream-42";

        using var call = new EntryCheck.EntryCheckClient(host.Channel).CheckEntries(new Metadata { { RequestIds.Header, id } }, DateTime.UtcNow + CallTimeout);
        await call.RequestStream.WriteAsync(Requests.Complete("AIS-LQ-R003"));
        await call.RequestStream.WriteAsync(Requests.UnknownNucleus("AIS-LQ-R004"));
        await call.RequestStream.CompleteAsync();
        var replies = new List<CheckEntryResponse>();
        await foreach (var reply in call.ResponseStream.ReadAllAsync()) replies.Add(reply);

        Assert.Equal(["AIS-LQ-R003", "AIS-LQ-R004"], replies.Select(r => r.EntryId));
        Assert.All(replies, r => Assert.Equal(id, r.RequestId));
        Assert.NotNull(replies[1].InputError);
        Assert.Equal(id, host.Log.Lines.Single(l => l.EventId == 1103 && (string?)l.Fields["EntryId"] == "AIS-LQ-R004").Fields["RequestId"]);
    }

    [Fact]
    public async Task CheckEntry_JsonPortWithId_EchoedInHeaderAndBody()
    {
        await using var host = await RunningHost.StartAsync(Rules);
        using var http = new HttpClient { BaseAddress = host.HttpAddress, Timeout = CallTimeout };
        using var message = new HttpRequestMessage(HttpMethod.Post, "/v1/entries:check")
        {
            Content = new StringContent(JsonFormatter.Default.Format(Requests.Complete("AIS-LQ-R005")), Encoding.UTF8, "application/json"),
        };
        message.Headers.Add(RequestIds.Header, "curl-1");

        using var reply = await http.SendAsync(message);

        Assert.Equal(HttpStatusCode.OK, reply.StatusCode);
        Assert.Equal("curl-1", reply.Headers.GetValues(RequestIds.Header).Single());
        Assert.Equal("curl-1", JsonParser.Default.Parse<CheckEntryResponse>(await reply.Content.ReadAsStringAsync()).RequestId);
    }

    [Theory]
    [InlineData("has a space")]
    [InlineData("tab\there")]
    public async Task CheckEntry_UnacceptableId_IsInvalidArgumentNamingTheHeader(string sent)
    {
        await using var host = await RunningHost.StartAsync(Rules);

        var error = await Assert.ThrowsAsync<RpcException>(() => new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(
            Requests.Complete("AIS-LQ-R006"), new Metadata { { RequestIds.Header, sent } }, DateTime.UtcNow + CallTimeout).ResponseAsync);

        Assert.Equal(StatusCode.InvalidArgument, error.StatusCode);
        Assert.StartsWith("x-request-id: character ", error.Status.Detail, StringComparison.Ordinal);
        Assert.Equal(RequestIds.Header, error.Trailers.GetValue("field"));
        var violation = Assert.Single(BadRequestDetailsTests.Violations(error));
        Assert.Equal(RequestIds.Header, violation.Field);
    }

    [Fact]
    public async Task CheckEntry_JsonPortIdTooLong_Is400WithBadRequestDetail()
    {
        await using var host = await RunningHost.StartAsync(Rules);
        using var http = new HttpClient { BaseAddress = host.HttpAddress, Timeout = CallTimeout };
        using var message = new HttpRequestMessage(HttpMethod.Get, "/v1/rules");
        message.Headers.Add(RequestIds.Header, new string('a', RequestIds.MaxLength + 1));

        using var reply = await http.SendAsync(message);

        Assert.Equal(HttpStatusCode.BadRequest, reply.StatusCode);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        Assert.Equal(3, body.RootElement.GetProperty("code").GetInt32());
        var detail = Assert.Single(body.RootElement.GetProperty("details").EnumerateArray());
        Assert.Equal("type.googleapis.com/google.rpc.BadRequest", detail.GetProperty("@type").GetString());
        Assert.Equal(RequestIds.Header, detail.GetProperty("fieldViolations")[0].GetProperty("field").GetString());
        Assert.Matches("^[0-9a-f]{32}$", reply.Headers.GetValues(RequestIds.Header).Single());
    }

    /// <summary>The engine's check activities, recorded as they stop, by entry id.</summary>
    private sealed class CheckSpans : IDisposable
    {
        private readonly ConcurrentQueue<Activity> _stopped = new();
        private readonly ActivityListener _listener;

        public CheckSpans()
        {
            _listener = new ActivityListener
            {
                ShouldListenTo = source => source.Name == TelemetryNames.Source,
                Sample = (ref ActivityCreationOptions<ActivityContext> _) => ActivitySamplingResult.AllDataAndRecorded,
                ActivityStopped = _stopped.Enqueue,
            };
            ActivitySource.AddActivityListener(_listener);
        }

        public IEnumerable<Activity> Of(string entryId) => _stopped.Where(a =>
            a.OperationName == TelemetryNames.CheckActivity && (string?)a.GetTagItem(TelemetryNames.EntryIdTag) == entryId);

        public void Dispose() => _listener.Dispose();
    }
}
