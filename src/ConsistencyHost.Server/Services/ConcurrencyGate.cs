using System.Threading.RateLimiting;
using Grpc.Core;
using Grpc.Core.Interceptors;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// Bounds the checks running at once. A call beyond the limit waits in a bounded queue; beyond the queue it is
/// refused at once with RESOURCE_EXHAUSTED naming the limit, so a load spike degrades into clear refusals that
/// a client can retry rather than into memory growth. Streaming calls hold one permit for their duration.
/// </summary>
public sealed class ConcurrencyGate(ConcurrencyLimiter limiter, ConcurrencyGateOptions options) : Interceptor
{
    /// <inheritdoc />
    public override async Task<TResponse> UnaryServerHandler<TRequest, TResponse>(
        TRequest request, ServerCallContext context, UnaryServerMethod<TRequest, TResponse> continuation)
    {
        using var lease = await Acquire(context);
        return await continuation(request, context);
    }

    /// <inheritdoc />
    public override async Task DuplexStreamingServerHandler<TRequest, TResponse>(
        IAsyncStreamReader<TRequest> requestStream, IServerStreamWriter<TResponse> responseStream,
        ServerCallContext context, DuplexStreamingServerMethod<TRequest, TResponse> continuation)
    {
        using var lease = await Acquire(context);
        await continuation(requestStream, responseStream, context);
    }

    private async Task<RateLimitLease> Acquire(ServerCallContext context)
    {
        var lease = await limiter.AcquireAsync(1, context.CancellationToken);
        if (lease.IsAcquired) return lease;
        lease.Dispose();
        throw new RpcException(new Status(StatusCode.ResourceExhausted,
            $"the host is at its limit of {options.MaxConcurrentCalls} concurrent calls with {options.QueueLimit} waiting; retry later"));
    }
}

/// <summary>Limits of <see cref="ConcurrencyGate"/>.</summary>
/// <param name="MaxConcurrentCalls">Calls checked at once; default a few per core is plenty for CPU-bound checks.</param>
/// <param name="QueueLimit">Calls allowed to wait for a permit.</param>
public sealed record ConcurrencyGateOptions(int MaxConcurrentCalls, int QueueLimit);
