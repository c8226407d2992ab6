using ConsistencyHost.Contract.V1;
using Google.Protobuf;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>The diagnostics service (echo and process memory): served with Server:EnableEcho, absent without it.</summary>
public sealed class DiagnosticsTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);

    [Fact]
    public async Task Echo_Enabled_ReturnsThePayloadByteForByte()
    {
        await using var config = await EchoConfig.CreateAsync();
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], config.Path);
        var client = new Diagnostics.DiagnosticsClient(host.Channel);
        // Every byte value, then a real request's bytes: the echo must not treat the payload as text.
        var payload = Enumerable.Range(0, 256).Select(b => (byte)b).Concat(Requests.Complete("E-1").ToByteArray()).ToArray();

        var reply = await client.EchoAsync(new EchoRequest { Payload = ByteString.CopyFrom(payload) }, deadline: DateTime.UtcNow + CallTimeout);

        Assert.Equal(payload, reply.Payload.ToByteArray());
    }

    [Fact]
    public async Task Echo_NotEnabled_IsUnimplemented()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new Diagnostics.DiagnosticsClient(host.Channel);

        var error = await Assert.ThrowsAsync<RpcException>(() =>
            client.EchoAsync(new EchoRequest { Payload = ByteString.CopyFromUtf8("x") }, deadline: DateTime.UtcNow + CallTimeout).ResponseAsync);

        Assert.Equal(StatusCode.Unimplemented, error.StatusCode);
    }

    [Fact]
    public async Task GetProcessMemory_AfterAFullCollection_CountsItAndReportsALiveHeap()
    {
        await using var config = await EchoConfig.CreateAsync();
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], config.Path);
        var client = new Diagnostics.DiagnosticsClient(host.Channel);
        // The test host runs in this process, so a collection forced here is one the host must report.
        var before = GC.CollectionCount(2);
        GC.Collect(2, GCCollectionMode.Forced, blocking: true);

        var memory = await client.GetProcessMemoryAsync(new ProcessMemoryRequest(), deadline: DateTime.UtcNow + CallTimeout);

        Assert.True(memory.Gen2Collections > before, $"gen2 collections {memory.Gen2Collections}, expected more than {before}");
        Assert.InRange(memory.ManagedHeapBytes, 1, memory.GcCommittedBytes);
        Assert.True(memory.WorkingSetBytes > 0);
    }

    /// <summary>A configuration file that turns the echo on; deleted on dispose.</summary>
    private sealed class EchoConfig : IAsyncDisposable
    {
        private EchoConfig(string path) => Path = path;

        public string Path { get; }

        public static async Task<EchoConfig> CreateAsync()
        {
            var path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), $"ch-echo-{Guid.NewGuid():N}.json");
            await File.WriteAllTextAsync(path, """{ "Server": { "EnableEcho": true } }""");
            return new EchoConfig(path);
        }

        public ValueTask DisposeAsync()
        {
            File.Delete(Path);
            return ValueTask.CompletedTask;
        }
    }
}
