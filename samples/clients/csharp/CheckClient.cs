using ConsistencyHost.Contract.V1;
using Grpc.Core;
using Grpc.Core.Interceptors;
using Grpc.Net.Client;
using Grpc.Net.Client.Configuration;

namespace ConsistencyHost.Client;

/// <summary>
/// A small convenience wrapper over the generated <see cref="EntryCheck.EntryCheckClient"/>: one reusable
/// channel, a deadline on every call, retries of the unary calls on UNAVAILABLE only, and the API key (if any)
/// in every call's metadata.
/// </summary>
/// <remarks>
/// Retrying only UNAVAILABLE, and only idempotent calls, follows AIP-194 (googleapis/aip, aip/general/0194.md):
/// a check has no effect on the host, so sending it again is safe; INVALID_ARGUMENT and the rest are final.
/// The policy is gRPC's own service-config retry (grpc/proposal A6), so back-off and jitter are the library's.
/// </remarks>
public sealed class CheckClient : IDisposable
{
    private readonly GrpcChannel _channel;
    private readonly EntryCheck.EntryCheckClient _client;
    private readonly CheckClientOptions _options;

    /// <summary>Opens a channel to <paramref name="address"/> (e.g. http://127.0.0.1:5151 or https://checks.example.org:5151).</summary>
    public CheckClient(Uri address, CheckClientOptions? options = null)
    {
        _options = options ?? CheckClientOptions.Default;
        _channel = GrpcChannel.ForAddress(address, new GrpcChannelOptions
        {
            HttpHandler = _options.HttpHandler,
            ServiceConfig = new ServiceConfig { MethodConfigs = { RetryUnary(_options) } },
        });
        // An interceptor rather than CallCredentials: those are sent over TLS only, and a loopback host with keys is cleartext.
        var invoker = _options.ApiKey is { } key
            ? _channel.Intercept(metadata =>
            {
                metadata.Add("x-api-key", key);
                return metadata;
            })
            : _channel.CreateCallInvoker();
        _client = new EntryCheck.EntryCheckClient(invoker);
    }

    /// <summary>Checks one entry. Throws <see cref="RpcException"/> for unusable input (INVALID_ARGUMENT).</summary>
    public async Task<CheckEntryResponse> CheckAsync(CheckEntryRequest request, CancellationToken cancellationToken = default) =>
        await _client.CheckEntryAsync(request, deadline: Deadline(), cancellationToken: cancellationToken);

    /// <summary>The host's rule catalogue.</summary>
    public async Task<ListRulesResponse> ListRulesAsync(CancellationToken cancellationToken = default) =>
        await _client.ListRulesAsync(new ListRulesRequest(), deadline: Deadline(), cancellationToken: cancellationToken);

    /// <summary>The generated client, for the streaming CheckEntries call.</summary>
    public EntryCheck.EntryCheckClient Generated => _client;

    /// <inheritdoc />
    public void Dispose() => _channel.Dispose();

    private DateTime Deadline() => DateTime.UtcNow + _options.CallTimeout;

    private static MethodConfig RetryUnary(CheckClientOptions options) => new()
    {
        Names =
        {
            new MethodName { Service = "consistencyhost.v1.EntryCheck", Method = "CheckEntry" },
            new MethodName { Service = "consistencyhost.v1.EntryCheck", Method = "ListRules" },
        },
        RetryPolicy = new RetryPolicy
        {
            MaxAttempts = options.MaxAttempts,
            InitialBackoff = options.InitialBackoff,
            MaxBackoff = options.MaxBackoff,
            BackoffMultiplier = 1.5,
            RetryableStatusCodes = { StatusCode.Unavailable },
        },
    };
}
