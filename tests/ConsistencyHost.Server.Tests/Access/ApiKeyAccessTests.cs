using System.Net;
using System.Text.Json;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Access;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Tests.Shared;
using Google.Protobuf;
using Grpc.Core;
using Grpc.Health.V1;
using Grpc.Reflection.V1Alpha;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Tests.Access;

/// <summary>
/// The real host bound beyond loopback (when the machine has such an address) with TLS from a private CA and one
/// API key: calls without the right key are UNAUTHENTICATED (gRPC) or 401 (JSON), health stays anonymous, and no
/// log line carries the key or any part of it.
/// </summary>
public sealed class ApiKeyAccessTests(ApiKeyAccessTests.Host fixture) : IClassFixture<ApiKeyAccessTests.Host>
{
    private const string Client = "eln-test";
    private static readonly string Key = Convert.ToBase64String(System.Security.Cryptography.RandomNumberGenerator.GetBytes(32));
    private static DateTime Deadline => DateTime.UtcNow.AddSeconds(60);

    [Fact]
    public async Task CheckEntry_NoKey_IsUnauthenticatedAndLoggedAsMissingKey()
    {
        using var channel = fixture.Server.Channel();

        var error = await Assert.ThrowsAsync<RpcException>(() => new EntryCheck.EntryCheckClient(channel).CheckEntryAsync(Requests.Complete("AIS-LQ-A001"), deadline: Deadline).ResponseAsync);

        Assert.Equal(StatusCode.Unauthenticated, error.StatusCode);
        Assert.Contains(AccessMessages.MissingKey, error.Status.Detail, StringComparison.Ordinal);
        Assert.Contains(fixture.Server.Log.Lines, l => l.EventId == 1200 && (string?)l.Fields["Reason"] == AccessMessages.MissingKey
            && (string?)l.Fields["Path"] == "/consistencyhost.v1.EntryCheck/CheckEntry" && ((string)l.Fields["RemoteAddress"]!).Length > 0);
    }

    [Fact]
    public async Task CheckEntry_WrongKey_IsUnauthenticatedAndLoggedAsUnknownKey()
    {
        using var channel = fixture.Server.Channel();
        var wrong = Key[..^4] + "AAAA";

        var error = await Assert.ThrowsAsync<RpcException>(() => new EntryCheck.EntryCheckClient(channel).CheckEntryAsync(Requests.Complete("AIS-LQ-A002"), SecuredHost.WithKey(wrong), Deadline).ResponseAsync);

        Assert.Equal(StatusCode.Unauthenticated, error.StatusCode);
        Assert.Contains(fixture.Server.Log.Lines, l => l.EventId == 1200 && (string?)l.Fields["Reason"] == AccessMessages.UnknownKey);
    }

    [Fact]
    public async Task CheckEntry_RightKey_ReturnsReportOverTlsAndLogsTheClientAtDebug()
    {
        using var channel = fixture.Server.Channel();

        var report = await new EntryCheck.EntryCheckClient(channel).CheckEntryAsync(Requests.MissingSolvent("AIS-LQ-A003"), SecuredHost.WithKey(Key), Deadline);

        Assert.Equal("https", fixture.Server.Grpc.Scheme);
        Assert.Equal(SecuredHost.BindAddress.ToString(), fixture.Server.Grpc.Host);
        Assert.Equal("AIS-LQ-A003", report.EntryId);
        Assert.Equal("solvent-not-stated", Assert.Single(report.Findings).Code);
        Assert.Contains(fixture.Server.Log.Lines, l => l.EventId == 1201 && l.Level == LogLevel.Debug && (string?)l.Fields["Client"] == Client);
    }

    [Fact]
    public async Task Health_NoKey_IsServing()
    {
        using var channel = fixture.Server.Channel();

        var reply = await new Health.HealthClient(channel).CheckAsync(new HealthCheckRequest(), deadline: Deadline);

        Assert.Equal(HealthCheckResponse.Types.ServingStatus.Serving, reply.Status);
    }

    [Fact]
    public async Task Reflection_NoKey_IsUnauthenticated()
    {
        using var channel = fixture.Server.Channel();
        using var call = new ServerReflection.ServerReflectionClient(channel).ServerReflectionInfo(deadline: Deadline);

        var error = await Assert.ThrowsAsync<RpcException>(async () =>
        {
            await call.RequestStream.WriteAsync(new ServerReflectionRequest { ListServices = "" });
            await call.ResponseStream.MoveNext(CancellationToken.None);
        });

        Assert.Equal(StatusCode.Unauthenticated, error.StatusCode);
    }

    [Theory]
    [InlineData("/v1/rules")]
    [InlineData("/openapi.json")]
    public async Task JsonPort_NoKey_Is401WithStatusBody(string path)
    {
        using var http = fixture.Server.JsonClient();

        using var reply = await http.GetAsync(path);

        Assert.Equal(HttpStatusCode.Unauthorized, reply.StatusCode);
        Assert.Contains("x-api-key", reply.Headers.WwwAuthenticate.ToString(), StringComparison.Ordinal);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        // google.rpc.Code UNAUTHENTICATED = 16 (googleapis/googleapis google/rpc/code.proto).
        Assert.Equal(16, body.RootElement.GetProperty("code").GetInt32());
    }

    [Fact]
    public async Task JsonPort_RightKey_ChecksTheEntry()
    {
        using var http = fixture.Server.JsonClient(Key);
        using var content = new StringContent(JsonFormatter.Default.Format(Requests.MissingSolvent("AIS-LQ-A004")), System.Text.Encoding.UTF8, "application/json");

        using var reply = await http.PostAsync("/v1/entries:check", content);

        Assert.Equal(HttpStatusCode.OK, reply.StatusCode);
        Assert.Equal("AIS-LQ-A004", JsonParser.Default.Parse<CheckEntryResponse>(await reply.Content.ReadAsStringAsync()).EntryId);
    }

    [Fact]
    public async Task JsonPort_HealthPathWithoutKey_IsNotRefused()
    {
        using var http = fixture.Server.JsonClient();

        // No endpoint is mapped under /health/ in this build (404); what matters is that the gate lets it through.
        using var reply = await http.GetAsync("/health/live");

        Assert.NotEqual(HttpStatusCode.Unauthorized, reply.StatusCode);
    }

    [Fact]
    public async Task Log_AfterAcceptedAndRefusedCalls_HoldsNoPartOfTheKey()
    {
        using var channel = fixture.Server.Channel();
        var client = new EntryCheck.EntryCheckClient(channel);
        await client.CheckEntryAsync(Requests.Complete("AIS-LQ-A005"), SecuredHost.WithKey(Key), Deadline);
        await Assert.ThrowsAsync<RpcException>(() => client.CheckEntryAsync(Requests.Complete("AIS-LQ-A006"), SecuredHost.WithKey(Key + "x"), Deadline).ResponseAsync);

        var text = fixture.Server.Log.AllText;

        Assert.Contains(fixture.Server.Log.Lines, l => l.EventId == 1201);
        Assert.Contains(fixture.Server.Log.Lines, l => l.EventId == 1200);
        for (var start = 0; start + 8 <= Key.Length; start++)
        {
            Assert.DoesNotContain(Key.Substring(start, 8), text, StringComparison.Ordinal);
        }
    }

    /// <summary>One host for the class: TLS from a test CA, one key, bound to <see cref="SecuredHost.BindAddress"/>.</summary>
    public sealed class Host : IAsyncLifetime
    {
        private TestPki? _pki;

        public SecuredHost Server { get; private set; } = null!;

        public async Task InitializeAsync()
        {
            _pki = TestPki.Create(SecuredHost.BindAddress);
            Server = await SecuredHost.StartAsync(new
            {
                BindAddress = SecuredHost.BindAddress.ToString(),
                Tls = new { CertificatePath = _pki.CertificatePath, KeyPath = _pki.KeyPath },
                ApiKeys = new Dictionary<string, string> { [Client] = Key },
            }, _pki.Authority);
        }

        public async Task DisposeAsync()
        {
            await Server.DisposeAsync();
            _pki?.Dispose();
        }
    }
}
