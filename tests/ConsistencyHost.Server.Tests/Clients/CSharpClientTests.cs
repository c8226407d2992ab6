using System.Net.Sockets;
using ConsistencyHost.Client;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.Clients;

/// <summary>The sample C# client (samples/clients/csharp) against the real host.</summary>
public sealed class CSharpClientTests
{
    [Fact]
    public async Task CheckAsync_MissingSolvent_ReturnsTheFinding()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        using var client = new CheckClient(host.Address);

        var report = await client.CheckAsync(Requests.MissingSolvent("AIS-LQ-C001"));

        Assert.Equal("AIS-LQ-C001", report.EntryId);
        Assert.Equal("solvent-not-stated", Assert.Single(report.Findings).Code);
    }

    [Fact]
    public async Task CheckAsync_FirstAttemptUnavailable_IsRetriedAndSucceeds()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        using var flaky = new FailFirstHandler(failures: 2);
        using var client = new CheckClient(host.Address, CheckClientOptions.Default with { HttpHandler = flaky, InitialBackoff = TimeSpan.FromMilliseconds(10) });

        var report = await client.CheckAsync(Requests.Complete("AIS-LQ-C002"));

        Assert.Equal("AIS-LQ-C002", report.EntryId);
        Assert.Equal(3, flaky.Attempts);
    }

    [Fact]
    public async Task CheckAsync_InvalidArgument_IsNotRetried()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        using var counting = new FailFirstHandler(failures: 0);
        using var client = new CheckClient(host.Address, CheckClientOptions.Default with { HttpHandler = counting });

        var error = await Assert.ThrowsAsync<RpcException>(() => client.CheckAsync(Requests.UnknownNucleus()));

        Assert.Equal(StatusCode.InvalidArgument, error.StatusCode);
        Assert.Equal(1, counting.Attempts);
    }

    [Fact]
    public async Task CheckAsync_ApiKeyOption_IsSentAndAccepted()
    {
        var key = new string('c', ConsistencyHost.Server.Access.AccessMessages.MinimumKeyLength);
        await using var host = await Access.SecuredHost.StartAsync(new { ApiKeys = new Dictionary<string, string> { ["eln-sample"] = key } }, authority: null);
        using var anonymous = new CheckClient(host.Grpc);
        using var client = new CheckClient(host.Grpc, CheckClientOptions.Default with { ApiKey = key });

        var refused = await Assert.ThrowsAsync<RpcException>(() => anonymous.CheckAsync(Requests.Complete("AIS-LQ-C003")));
        var report = await client.CheckAsync(Requests.Complete("AIS-LQ-C004"));

        Assert.Equal(StatusCode.Unauthenticated, refused.StatusCode);
        Assert.Equal("AIS-LQ-C004", report.EntryId);
    }

    /// <summary>Fails the first calls as a refused connection would (gRPC maps it to UNAVAILABLE), then forwards.</summary>
    private sealed class FailFirstHandler(int failures) : DelegatingHandler(new SocketsHttpHandler())
    {
        private int _attempts;

        public int Attempts => _attempts;

        protected override Task<HttpResponseMessage> SendAsync(HttpRequestMessage request, CancellationToken cancellationToken) =>
            Interlocked.Increment(ref _attempts) <= failures
                ? throw new HttpRequestException(HttpRequestError.ConnectionError, "connection refused (simulated)", new SocketException((int)SocketError.ConnectionRefused))
                : base.SendAsync(request, cancellationToken);
    }
}
