using ConsistencyHost.Contract.V1;
using ConsistencyHost.LoadGenerator.Entries;
using ConsistencyHost.LoadGenerator.Measuring;
using Grpc.Core;
using Grpc.Net.Client;

namespace ConsistencyHost.LoadGenerator.Target;

/// <summary>One kind of call the load generator makes; the i-th call uses the i-th request of the mix (cycling).</summary>
/// <param name="Name">"echo" or "check", as it appears in the reports.</param>
/// <param name="Invoke">Makes call number i; returns null when the reply is right, else why it is wrong.</param>
public sealed record CallKind(string Name, Func<long, CancellationToken, Task<string?>> Invoke)
{
    /// <summary>How long one call may take before it counts as failed (DEADLINE_EXCEEDED).</summary>
    public static TimeSpan CallTimeout { get; set; } = TimeSpan.FromSeconds(10);

    /// <summary>Echo of the i-th check request's bytes; the reply must carry them back unchanged.</summary>
    public static CallKind Echo(GrpcChannel channel, Workload workload)
    {
        var client = new Diagnostics.DiagnosticsClient(channel);
        return new CallKind("echo", async (i, token) =>
        {
            var request = workload.Echoes[(int)(i % workload.Echoes.Count)];
            var reply = await client.EchoAsync(request, Options(token));
            return reply.Payload.Span.SequenceEqual(request.Payload.Span) ? null : "the echo differs from the payload sent";
        });
    }

    /// <summary>
    /// CheckEntry of the i-th entry; the reply must name the entry and every rule must have run to completion
    /// (or been skipped): a rule that overran its deadline under load returned less than the entry deserves.
    /// The host's rule timings of each reply go to <paramref name="times"/> when given.
    /// </summary>
    public static CallKind Check(GrpcChannel channel, Workload workload, ServerTimes? times = null)
    {
        var client = new EntryCheck.EntryCheckClient(channel);
        return new CallKind("check", async (i, token) =>
        {
            var request = workload.Checks[(int)(i % workload.Checks.Count)];
            var reply = await client.CheckEntryAsync(request, Options(token));
            times?.Add(reply);
            if (reply.EntryId != request.EntryId) return $"reply names entry '{reply.EntryId}', expected '{request.EntryId}'";
            if (reply.RuleRuns.Count == 0) return $"entry {request.EntryId}: no rule ran";
            var unfinished = reply.RuleRuns.FirstOrDefault(r => r.Status is not (RuleRunStatus.Ok or RuleRunStatus.Skipped));
            return unfinished is null ? null : $"entry {request.EntryId}: rule {unfinished.RuleId} ended {unfinished.Status} ({unfinished.Message})";
        });
    }

    private static CallOptions Options(CancellationToken token) => new(deadline: DateTime.UtcNow + CallTimeout, cancellationToken: token);
}
