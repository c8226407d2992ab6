using System.Net;
using System.Text;
using System.Text.Json;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Tests.Shared;
using Google.Protobuf;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// The JSON face of the contract (google.api.http rules, ASP.NET Core JSON transcoding) called with a plain
/// HttpClient over HTTP/1.1, compared with what gRPC answers for the same request.
/// </summary>
public sealed class JsonHttpTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);
    private static readonly string[] AllRules =
    [
        "ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Rules.SolventResidual", "ConsistencyHost.Rules.SignalCount",
    ];

    [Fact]
    public async Task CheckEntry_PostedJson_ReturnsSameReportAsGrpc()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);
        var request = Requests.MissingSolvent("AIS-LQ-J001");

        using var reply = await http.PostAsync("/v1/entries:check", Json(JsonFormatter.Default.Format(request)));
        var viaGrpc = await new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(request, deadline: DateTime.UtcNow + CallTimeout);

        Assert.Equal(HttpStatusCode.OK, reply.StatusCode);
        Assert.Equal(HttpVersion.Version11, reply.Version);
        var viaHttp = JsonParser.Default.Parse<CheckEntryResponse>(await reply.Content.ReadAsStringAsync());
        Assert.Equal(Comparable(viaGrpc), Comparable(viaHttp));
        Assert.Contains(viaHttp.Findings, f => f.Code == "solvent-not-stated");
    }

    [Fact]
    public async Task CheckEntry_UnknownNucleus_IsHttp400WithFieldPath()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);

        using var reply = await http.PostAsync("/v1/entries:check", Json(JsonFormatter.Default.Format(Requests.UnknownNucleus())));

        Assert.Equal(HttpStatusCode.BadRequest, reply.StatusCode);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        // google.rpc.Code INVALID_ARGUMENT = 3 (googleapis/googleapis google/rpc/code.proto).
        Assert.Equal(3, body.RootElement.GetProperty("code").GetInt32());
        Assert.StartsWith("spectra[0].nucleus: '77Se' is not a supported nucleus", body.RootElement.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task CheckEntry_BodyOverLimit_IsRefusedWith413()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);
        var request = Requests.Complete();
        request.ReportedText.Add(new string('x', 4 * 1024 * 1024 + 1));

        // Expect: 100-continue lets the host answer from Content-Length before the client sends the body
        // (RFC 9110 section 10.1.1); otherwise the refused upload ends in a reset rather than a readable 413.
        using var message = new HttpRequestMessage(HttpMethod.Post, "/v1/entries:check") { Content = Json(JsonFormatter.Default.Format(request)) };
        message.Headers.ExpectContinue = true;

        using var reply = await http.SendAsync(message);

        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, reply.StatusCode);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        // google.rpc.Code RESOURCE_EXHAUSTED = 8, as a gRPC call over the limit gets.
        Assert.Equal(8, body.RootElement.GetProperty("code").GetInt32());
    }

    [Fact]
    public async Task CheckEntry_MisspelledTopLevelField_IsHttp400NamingIt()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);
        var json = JsonFormatter.Default.Format(Requests.Complete()).Replace("\"structure\"", "\"structur\"", StringComparison.Ordinal);

        using var reply = await http.PostAsync("/v1/entries:check", Json(json));

        Assert.Equal(HttpStatusCode.BadRequest, reply.StatusCode);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        Assert.Equal(3, body.RootElement.GetProperty("code").GetInt32());
        Assert.StartsWith("structur: unknown field; expected one of ", body.RootElement.GetProperty("message").GetString(), StringComparison.Ordinal);
        // google.rpc.BadRequest (googleapis/googleapis google/rpc/error_details.proto) carries each field path.
        var detail = Assert.Single(body.RootElement.GetProperty("details").EnumerateArray());
        Assert.Equal("type.googleapis.com/google.rpc.BadRequest", detail.GetProperty("@type").GetString());
        var violation = Assert.Single(detail.GetProperty("fieldViolations").EnumerateArray());
        Assert.Equal("structur", violation.GetProperty("field").GetString());
    }

    [Fact]
    public async Task CheckEntry_MisspelledNestedField_NamesItsPath()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);
        var json = JsonFormatter.Default.Format(Requests.Complete()).Replace("\"nucleus\"", "\"nucelus\"", StringComparison.Ordinal);

        using var reply = await http.PostAsync("/v1/entries:check", Json(json));

        Assert.Equal(HttpStatusCode.BadRequest, reply.StatusCode);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        Assert.StartsWith("spectra[0].nucelus: unknown field", body.RootElement.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task CheckEntry_ProtoFieldNames_AreAcceptedLikeJsonNames()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);
        // The protobuf JSON mapping accepts the proto field name as well as its lowerCamel JSON name.
        var json = new JsonFormatter(JsonFormatter.Settings.Default.WithPreserveProtoFieldNames(true)).Format(Requests.Complete());

        using var reply = await http.PostAsync("/v1/entries:check", Json(json));

        Assert.Equal(HttpStatusCode.OK, reply.StatusCode);
    }

    [Fact]
    public async Task CheckEntry_InvalidJson_IsHttp400WithLineAndColumn()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);

        using var reply = await http.PostAsync("/v1/entries:check", Json("{\n  \"entryId\": \"AIS-LQ-J002\",\n  \"structure\": }"));

        Assert.Equal(HttpStatusCode.BadRequest, reply.StatusCode);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        Assert.Equal(3, body.RootElement.GetProperty("code").GetInt32());
        Assert.StartsWith("request body is not valid JSON at line 3, column ", body.RootElement.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task CheckEntry_ChunkedBodyOverLimit_IsRefusedWith413()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);
        var request = Requests.Complete();
        request.ReportedText.Add(new string('x', 4 * 1024 * 1024 + 1));
        // A stream of unknown length is sent chunked (Transfer-Encoding: chunked, no Content-Length).
        using var content = new StreamContent(new UnseekableStream(Encoding.UTF8.GetBytes(JsonFormatter.Default.Format(request))));
        content.Headers.ContentType = new("application/json");

        using var reply = await http.PostAsync("/v1/entries:check", content);

        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, reply.StatusCode);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        Assert.Equal(8, body.RootElement.GetProperty("code").GetInt32());
    }

    [Fact]
    public async Task ListRules_Get_ListsLoadedRules()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);

        var rules = JsonParser.Default.Parse<ListRulesResponse>(await http.GetStringAsync("/v1/rules"));

        Assert.Equal(["signal-count", "solvent-residual", "spectrum-metadata"], rules.Rules.Select(r => r.Id));
        Assert.All(rules.Rules, r => Assert.Equal(RuleLoadStatus.Loaded, r.LoadStatus));
    }

    [Fact]
    public async Task CurlSample_JsonBodyFromDocs_FlagsResidualChloroformLine()
    {
        await using var host = await RunningHost.StartAsync(AllRules);
        using var http = NewClient(host);
        var markdown = await File.ReadAllTextAsync(Path.Combine(RepoPaths.Samples, "clients", "curl.md"));
        var body = DocBlocks.Json(markdown).FirstOrDefault();
        Assert.True(body is not null, "samples/clients/curl.md has no ```json block");

        using var reply = await http.PostAsync("/v1/entries:check", Json(body));

        Assert.Equal(HttpStatusCode.OK, reply.StatusCode);
        var report = JsonParser.Default.Parse<CheckEntryResponse>(await reply.Content.ReadAsStringAsync());
        Assert.Equal("AIS-LQ-0436", report.EntryId);
        // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (CHCl3 in CDCl3 at 7.26 ppm).
        Assert.Contains(report.Findings, f => f.RuleId == "solvent-residual" && f.Peaks.Any(p => p.Signal == 1));
    }

    private static HttpClient NewClient(RunningHost host) => new()
    {
        BaseAddress = host.HttpAddress,
        DefaultRequestVersion = HttpVersion.Version11,
        DefaultVersionPolicy = HttpVersionPolicy.RequestVersionExact,
        Timeout = CallTimeout,
    };

    private static StringContent Json(string text) => new(text, Encoding.UTF8, "application/json");

    // Elapsed times and the calls' request ids differ between two calls; everything else must match.
    private static CheckEntryResponse Comparable(CheckEntryResponse response)
    {
        var copy = response.Clone();
        copy.RequestId = "";
        foreach (var run in copy.RuleRuns) run.ElapsedMs = 0;
        return copy;
    }

    /// <summary>A read-only stream that hides its length, so HttpClient sends it chunked.</summary>
    private sealed class UnseekableStream(byte[] bytes) : Stream
    {
        private readonly MemoryStream _inner = new(bytes, writable: false);
        public override bool CanRead => true;
        public override bool CanSeek => false;
        public override bool CanWrite => false;
        public override long Length => throw new NotSupportedException();
        public override long Position { get => throw new NotSupportedException(); set => throw new NotSupportedException(); }
        public override int Read(byte[] buffer, int offset, int count) => _inner.Read(buffer, offset, count);
        public override void Flush() { }
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();
    }
}
