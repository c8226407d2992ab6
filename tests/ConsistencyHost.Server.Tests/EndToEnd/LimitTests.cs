using ConsistencyHost.Contract.V1;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.EndToEnd;

public sealed class LimitTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);

    [Fact]
    public async Task CheckEntry_BeyondConcurrencyLimit_IsResourceExhaustedNamingTheLimit()
    {
        var config = Path.Combine(Path.GetTempPath(), $"ch-limits-{Guid.NewGuid():N}.json");
        await File.WriteAllTextAsync(config, """{ "Server": { "MaxConcurrentCalls": 1, "QueueLimit": 0 } }""");
        try
        {
            await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], config);
            var client = new EntryCheck.EntryCheckClient(host.Channel);

            // An open stream holds the only permit: once its first reply arrives, the permit is certainly taken.
            using var stream = client.CheckEntries(deadline: DateTime.UtcNow + CallTimeout);
            await stream.RequestStream.WriteAsync(Requests.Complete("S-1"));
            Assert.True(await stream.ResponseStream.MoveNext(CancellationToken.None));

            var refused = await Assert.ThrowsAsync<RpcException>(() =>
                client.CheckEntryAsync(Requests.Complete("U-1"), deadline: DateTime.UtcNow + CallTimeout).ResponseAsync);

            Assert.Equal(StatusCode.ResourceExhausted, refused.StatusCode);
            Assert.Contains("limit of 1 concurrent calls", refused.Status.Detail, StringComparison.Ordinal);
            await stream.RequestStream.CompleteAsync();
        }
        finally
        {
            File.Delete(config);
        }
    }

    [Fact]
    public async Task CheckEntry_StructureAboveAtomLimit_IsInvalidArgumentNamingTheLimit()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);
        var request = Requests.Complete("L-1");
        request.Structure = new Structure { Smiles = new string('C', 600) };

        var error = await Assert.ThrowsAsync<RpcException>(() => client.CheckEntryAsync(request, deadline: DateTime.UtcNow + CallTimeout).ResponseAsync);

        Assert.Equal(StatusCode.InvalidArgument, error.StatusCode);
        Assert.Equal("structure.smiles: has 600 atoms; the limit is 500", error.Status.Detail);
    }

    [Fact]
    public async Task CheckEntry_SmilesAboveLengthLimit_IsRefusedBeforeReading()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);
        var request = Requests.Complete("L-3");
        request.Structure = new Structure { Smiles = new string('C', 100_000) };

        var error = await Assert.ThrowsAsync<RpcException>(() => client.CheckEntryAsync(request, deadline: DateTime.UtcNow + CallTimeout).ResponseAsync);

        Assert.Equal(StatusCode.InvalidArgument, error.StatusCode);
        Assert.Equal("structure.smiles: is 100000 characters; the limit for a SMILES is 5000", error.Status.Detail);
    }

    [Fact]
    public async Task CheckEntry_RequestAboveMessageLimit_IsResourceExhausted()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);
        var request = Requests.Complete("L-2");
        request.ReportedText.Add(new string('x', 5 * 1024 * 1024));

        var error = await Assert.ThrowsAsync<RpcException>(() => client.CheckEntryAsync(request, deadline: DateTime.UtcNow + CallTimeout).ResponseAsync);

        Assert.Equal(StatusCode.ResourceExhausted, error.StatusCode);
    }
}
