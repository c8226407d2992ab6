using System.Security.Cryptography;
using System.Text;
using ConsistencyHost.Contract.Worker;
using Grpc.Core;
using Grpc.Core.Interceptors;

namespace ConsistencyHost.Worker;

/// <summary>
/// Refuses every call that does not carry this launch's secret. The socket's 0700 folder already keeps
/// other users out; the secret keeps out other processes of the same user that find the socket.
/// </summary>
internal sealed class SecretInterceptor(LaunchSecret secret) : Interceptor
{
    public override Task<TResponse> UnaryServerHandler<TRequest, TResponse>(
        TRequest request, ServerCallContext context, UnaryServerMethod<TRequest, TResponse> continuation)
    {
        var presented = context.RequestHeaders.GetValue(WorkerHandshake.SecretHeader) ?? "";
        if (!CryptographicOperations.FixedTimeEquals(Encoding.UTF8.GetBytes(presented), secret.Bytes))
        {
            throw new RpcException(new Status(StatusCode.Unauthenticated, "missing or wrong worker secret"));
        }

        return continuation(request, context);
    }
}

/// <summary>The per-launch secret the host wrote on standard input.</summary>
internal sealed record LaunchSecret(byte[] Bytes);
