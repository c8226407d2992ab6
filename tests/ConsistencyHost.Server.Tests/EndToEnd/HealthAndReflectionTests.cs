using Grpc.Health.V1;
using Grpc.Reflection.V1Alpha;

namespace ConsistencyHost.Server.Tests.EndToEnd;

public sealed class HealthAndReflectionTests
{
    [Fact]
    public async Task Reflection_ListServices_FindsTheCheckService()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new ServerReflection.ServerReflectionClient(host.Channel);
        using var call = client.ServerReflectionInfo(deadline: DateTime.UtcNow.AddSeconds(60));

        await call.RequestStream.WriteAsync(new ServerReflectionRequest { ListServices = "" });
        await call.RequestStream.CompleteAsync();
        Assert.True(await call.ResponseStream.MoveNext(CancellationToken.None));

        var names = call.ResponseStream.Current.ListServicesResponse.Service.Select(s => s.Name).ToList();
        Assert.Contains("consistencyhost.v1.EntryCheck", names);
        Assert.Contains("grpc.health.v1.Health", names);
    }

    [Fact]
    public async Task Health_AllPluginsLoaded_IsServing()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new Health.HealthClient(host.Channel);

        var reply = await client.CheckAsync(new HealthCheckRequest(), deadline: DateTime.UtcNow.AddSeconds(60));

        Assert.Equal(HealthCheckResponse.Types.ServingStatus.Serving, reply.Status);
    }
}
