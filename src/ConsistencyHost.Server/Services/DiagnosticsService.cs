using ConsistencyHost.Contract.V1;
using Grpc.Core;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// <c>consistencyhost.v1.Diagnostics</c>: an echo that returns the payload and does nothing else, so that a load
/// test measures the transport (HTTP/2, framing, protobuf, the interceptors every call passes) in the same process
/// as the checks; and the process's memory, so that a soak test can watch the managed heap. Mapped only when
/// <c>Server:EnableEcho</c> is true; otherwise the host answers UNIMPLEMENTED.
/// </summary>
public sealed class DiagnosticsService : Diagnostics.DiagnosticsBase
{
    /// <inheritdoc />
    public override Task<EchoReply> Echo(EchoRequest request, ServerCallContext context) =>
        Task.FromResult(new EchoReply { Payload = request.Payload });

    /// <inheritdoc />
    public override Task<ProcessMemory> GetProcessMemory(ProcessMemoryRequest request, ServerCallContext context)
    {
        var info = GC.GetGCMemoryInfo();
        return Task.FromResult(new ProcessMemory
        {
            ManagedHeapBytes = info.HeapSizeBytes,
            GcCommittedBytes = info.TotalCommittedBytes,
            WorkingSetBytes = Environment.WorkingSet,
            Gen2Collections = GC.CollectionCount(2),
        });
    }
}
