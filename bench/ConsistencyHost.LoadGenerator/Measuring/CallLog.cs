using System.Collections.Concurrent;
using Grpc.Core;

namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>
/// What happened to the calls of one phase: latencies of successful calls, and every failure counted by its
/// gRPC status (plus a few messages to show). Thread-safe; workers add to it concurrently.
/// </summary>
public sealed class CallLog
{
    private const int MessagesKept = 5;
    private readonly ConcurrentBag<double> _latenciesMs = [];
    private readonly ConcurrentDictionary<string, int> _errors = new(StringComparer.Ordinal);
    private readonly ConcurrentQueue<string> _messages = new();

    /// <summary>Successful calls.</summary>
    public int Succeeded => _latenciesMs.Count;

    /// <summary>Failed calls of every kind.</summary>
    public int Failed => _errors.Values.Sum();

    /// <summary>Failures by kind (a gRPC status name, or a reason the client found the reply wrong).</summary>
    public IReadOnlyDictionary<string, int> ErrorsByKind => new SortedDictionary<string, int>(_errors, StringComparer.Ordinal);

    /// <summary>The first few failure messages.</summary>
    public IReadOnlyList<string> Messages => [.. _messages];

    /// <summary>Latencies of the successful calls, ms.</summary>
    public IReadOnlyCollection<double> LatenciesMs => _latenciesMs;

    /// <summary>Records a success.</summary>
    public void Success(double latencyMs) => _latenciesMs.Add(latencyMs);

    /// <summary>Records a failed call.</summary>
    public void Failure(string kind, string message)
    {
        _errors.AddOrUpdate(kind, 1, (_, n) => n + 1);
        if (_messages.Count < MessagesKept) _messages.Enqueue($"{kind}: {message}");
    }

    /// <summary>Records a call that ended with a gRPC error.</summary>
    public void Failure(RpcException error) => Failure(error.StatusCode.ToString(), error.Status.Detail);
}
