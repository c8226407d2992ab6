using System.Net;
using System.Net.Sockets;
using ConsistencyHost.Client;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Dispatch;
using ConsistencyHost.Server.Tests.EndToEnd;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.Replicas;

/// <summary>The dispatcher's contract with the caller: unique ids in, one report per id out, clear failures.</summary>
public sealed class ReplicaDispatcherTests
{
    [Fact]
    public async Task Dispatch_TwoHosts_ReportsEqualTheUnaryChecks()
    {
        await using var first = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        await using var second = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var entries = Enumerable.Range(1, 40).Select(i => i % 2 == 0 ? Requests.MissingSolvent($"AIS-LQ-D{i:000}") : Requests.UnknownNucleus($"AIS-LQ-D{i:000}")).ToList();
        using var dispatcher = ReplicaDispatcher.Connect([first.Address, second.Address], DispatchOptions.Default with { MaxInFlightPerReplica = 4 });
        using var client = new CheckClient(first.Address);

        var run = dispatcher.Dispatch(entries.ToAsyncEnumerable());
        var reports = new Dictionary<string, CheckEntryResponse>();
        await foreach (var report in run) reports.Add(report.EntryId, report); // Add throws on a repeated id

        Assert.Equal(entries.Count, reports.Count);
        Assert.Equal(entries.Count, run.Summary.Replicas.Sum(replica => replica.Reported));
        Assert.All(entries.Where((_, i) => i % 2 == 1), entry => Assert.Equal("solvent-not-stated", Assert.Single(reports[entry.EntryId].Findings).Code));
        Assert.All(entries.Where((_, i) => i % 2 == 0), entry => Assert.Contains("nucleus", reports[entry.EntryId].InputError.Field));
        var unary = await client.CheckAsync(entries[1]);
        Assert.Equal(unary.Findings, reports[entries[1].EntryId].Findings);
    }

    [Fact]
    public async Task Dispatch_SameEntryIdTwice_ThrowsArgumentExceptionNamingTheId()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        using var dispatcher = ReplicaDispatcher.Connect([host.Address]);
        var entries = new[] { Requests.Complete("AIS-LQ-D100"), Requests.Complete("AIS-LQ-D101"), Requests.Complete("AIS-LQ-D100") };

        var error = await Assert.ThrowsAsync<ArgumentException>(async () =>
        {
            await foreach (var _ in dispatcher.Dispatch(entries.ToAsyncEnumerable())) { }
        });

        Assert.Contains("entry id 'AIS-LQ-D100' appears twice in the input (entries 1 and 3)", error.Message);
    }

    [Fact]
    public async Task Dispatch_NoReplicaAnswers_ThrowsUnavailableAfterBoundedFailures()
    {
        var nobody = new Uri($"http://127.0.0.1:{ClosedPort()}");
        var options = DispatchOptions.Default with { InitialBackoff = TimeSpan.FromMilliseconds(10), MaxBackoff = TimeSpan.FromMilliseconds(40), MaxReplicaFailures = 3 };
        using var dispatcher = ReplicaDispatcher.Connect([nobody], options);
        var run = dispatcher.Dispatch(new[] { Requests.Complete("AIS-LQ-D200") }.ToAsyncEnumerable());

        var error = await Assert.ThrowsAsync<RpcException>(async () =>
        {
            await foreach (var _ in run) { }
        });

        Assert.Equal(StatusCode.Unavailable, error.StatusCode);
        Assert.Contains("all 1 replicas failed 3 times in a row with 1 entries unanswered", error.Status.Detail);
        Assert.Equal((1, 0, 3, true), (run.Summary.Sent, run.Summary.Reported, run.Summary.Replicas[0].Failures, run.Summary.Replicas[0].GivenUp));
    }

    [Fact]
    public void Connect_SameAddressTwice_ThrowsArgumentException()
    {
        var address = new Uri("http://127.0.0.1:5151");

        var error = Assert.Throws<ArgumentException>(() => ReplicaDispatcher.Connect([address, address]));

        Assert.Contains("replica address http://127.0.0.1:5151/ is listed twice", error.Message);
    }

    // A port that was free a moment ago; nothing listens on it, so a connection is refused at once.
    private static int ClosedPort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }
}
