using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Access;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Tests.Shared;
using Grpc.Core;
using Grpc.Health.V1;

namespace ConsistencyHost.Server.Tests.Access;

/// <summary>
/// The real host beyond loopback with a client CA and no keys: a certificate from that CA is authentication
/// enough; no certificate, or one from another CA, is UNAUTHENTICATED; health needs none.
/// </summary>
public sealed class MutualTlsAccessTests(MutualTlsAccessTests.Host fixture) : IClassFixture<MutualTlsAccessTests.Host>
{
    private static DateTime Deadline => DateTime.UtcNow.AddSeconds(60);

    [Fact]
    public async Task CheckEntry_ClientCertificateFromTheCa_ReturnsReportAndLogsItsName()
    {
        using var certificate = fixture.Pki.IssueClient("eln-lindqvist");
        using var channel = fixture.Server.Channel(certificate);

        var report = await new EntryCheck.EntryCheckClient(channel).CheckEntryAsync(Requests.Complete("AIS-LQ-M001"), deadline: Deadline);

        Assert.Equal("AIS-LQ-M001", report.EntryId);
        Assert.Contains(fixture.Server.Log.Lines, l => l.EventId == 1201 && (string?)l.Fields["Client"] == "eln-lindqvist");
    }

    [Fact]
    public async Task CheckEntry_NoClientCertificate_IsUnauthenticated()
    {
        using var channel = fixture.Server.Channel();

        var error = await Assert.ThrowsAsync<RpcException>(() => new EntryCheck.EntryCheckClient(channel).CheckEntryAsync(Requests.Complete("AIS-LQ-M002"), deadline: Deadline).ResponseAsync);

        Assert.Equal(StatusCode.Unauthenticated, error.StatusCode);
        Assert.Contains(fixture.Server.Log.Lines, l => l.EventId == 1200 && (string?)l.Fields["Reason"] == AccessMessages.NoClientCertificate);
    }

    [Fact]
    public async Task CheckEntry_CertificateFromAnotherCa_IsUnauthenticated()
    {
        using var stranger = TestPki.CreateAuthority("Some other CA");
        using var certificate = fixture.Pki.IssueClient("eln-lindqvist", stranger);
        using var channel = fixture.Server.Channel(certificate);

        var error = await Assert.ThrowsAsync<RpcException>(() => new EntryCheck.EntryCheckClient(channel).CheckEntryAsync(Requests.Complete("AIS-LQ-M003"), deadline: Deadline).ResponseAsync);

        Assert.Equal(StatusCode.Unauthenticated, error.StatusCode);
        Assert.Contains(fixture.Server.Log.Lines, l => l.EventId == 1200 && (string?)l.Fields["Reason"] == AccessMessages.UntrustedClientCertificate);
    }

    [Fact]
    public async Task Health_NoClientCertificate_IsServing()
    {
        using var channel = fixture.Server.Channel();

        var reply = await new Health.HealthClient(channel).CheckAsync(new HealthCheckRequest(), deadline: Deadline);

        Assert.Equal(HealthCheckResponse.Types.ServingStatus.Serving, reply.Status);
    }

    /// <summary>One host for the class: TLS and a client CA, no keys.</summary>
    public sealed class Host : IAsyncLifetime
    {
        public TestPki Pki { get; } = TestPki.Create(SecuredHost.BindAddress);

        public SecuredHost Server { get; private set; } = null!;

        public async Task InitializeAsync() => Server = await SecuredHost.StartAsync(new
        {
            BindAddress = SecuredHost.BindAddress.ToString(),
            Tls = new { CertificatePath = Pki.CertificatePath, KeyPath = Pki.KeyPath, ClientCertificateAuthorityPath = Pki.AuthorityPath },
        }, Pki.Authority);

        public async Task DisposeAsync()
        {
            await Server.DisposeAsync();
            Pki.Dispose();
        }
    }
}
