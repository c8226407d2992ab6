using Grpc.Core;
using Grpc.Net.Client;
using Grpc.Net.Client.Balancer;
using Grpc.Net.Client.Configuration;
using Microsoft.Extensions.DependencyInjection;

namespace ConsistencyHost.LoadGenerator.Target;

/// <summary>Channels to the host: one address, or several replicas balanced by the client.</summary>
public static class Channels
{
    /// <summary>A channel to one host (HTTP/2 over cleartext, several connections allowed).</summary>
    public static GrpcChannel To(Uri target) => GrpcChannel.ForAddress(target, new GrpcChannelOptions
    {
        HttpHandler = new SocketsHttpHandler { EnableMultipleHttp2Connections = true },
    });

    /// <summary>
    /// A channel over several replicas with Grpc.Net.Client's own client-side balancing: a static resolver that
    /// returns the given addresses and the round_robin policy, which keeps a connection to each and sends each
    /// call to the next ready one. With a DNS name (dns:///service.namespace.svc.cluster.local:5151) the
    /// built-in DNS resolver takes the static resolver's place; nothing else changes.
    /// </summary>
    public static GrpcChannel RoundRobin(IReadOnlyList<Uri> replicas)
    {
        var addresses = replicas.Select(r => new BalancerAddress(r.Host, r.Port)).ToArray();
        var services = new ServiceCollection();
        services.AddSingleton<ResolverFactory>(new StaticResolverFactory(_ => addresses));
        return GrpcChannel.ForAddress("static:///consistencyhost-replicas", new GrpcChannelOptions
        {
            Credentials = ChannelCredentials.Insecure,
            ServiceConfig = new ServiceConfig { LoadBalancingConfigs = { new RoundRobinConfig() } },
            ServiceProvider = services.BuildServiceProvider(),
        });
    }
}
