using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Dispatch;
using Grpc.Net.Client;

namespace ConsistencyHost.Cli.Remote;

/// <summary>
/// The hosts of <c>--server</c> (one address or several, comma-separated or repeated), each on a channel of
/// <see cref="ServerChannel"/> (key, private CA), behind one <see cref="ReplicaDispatcher"/>. Owns the channels.
/// </summary>
internal sealed class RemoteHosts : IDisposable
{
    private readonly IReadOnlyList<GrpcChannel> _channels;

    private RemoteHosts(IReadOnlyList<GrpcChannel> channels, string description)
    {
        _channels = channels;
        Dispatcher = new ReplicaDispatcher(channels);
        Description = description;
    }

    public ReplicaDispatcher Dispatcher { get; }

    /// <summary>The addresses as given, for messages.</summary>
    public string Description { get; }

    public static RemoteHosts Open(ParsedArguments args)
    {
        var addresses = args.Values("--server").SelectMany(value => value.Split(',', StringSplitOptions.TrimEntries)).ToList();
        if (addresses.Any(address => address.Length == 0)) throw new UsageException("--server has an empty address; expected URL or URL1,URL2,... (http:// or https://)");
        var repeated = addresses.GroupBy(ServerChannel.Address).FirstOrDefault(group => group.Count() > 1);
        if (repeated is not null) throw new UsageException($"--server lists {repeated.Key} twice; give each host once");
        return new RemoteHosts([.. addresses.Select(address => ServerChannel.Open(address, args))], string.Join(", ", addresses));
    }

    public void Dispose()
    {
        Dispatcher.Dispose();
        foreach (var channel in _channels) channel.Dispose();
    }
}
