using ConsistencyHost.Contract.V1;
using Grpc.Core;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// The echo of <c>consistencyhost.v1.Diagnostics</c>: returns the payload and does nothing else, so that a load
/// test measures the transport (HTTP/2, framing, protobuf, the interceptors every call passes) in the same process
/// as the checks. Mapped only when <c>Server:EnableEcho</c> is true; otherwise the host answers UNIMPLEMENTED.
/// </summary>
public sealed class DiagnosticsService : Diagnostics.DiagnosticsBase
{
    /// <inheritdoc />
    public override Task<EchoReply> Echo(EchoRequest request, ServerCallContext context) =>
        Task.FromResult(new EchoReply { Payload = request.Payload });
}
