using System.Collections.Concurrent;
using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>
/// The host's own timings, as each CheckEntry reply reports them (RuleRun.elapsed_ms per rule), summed over
/// the calls of a run: with the client's latency they show how much of a call the rules take and how much is
/// everything else (transport, intake, perception, queueing for a thread).
/// </summary>
public sealed class ServerTimes
{
    private readonly ConcurrentDictionary<string, (double TotalMs, int Runs)> _byRule = new(StringComparer.Ordinal);
    private int _replies;

    /// <summary>Adds the rule runs of one reply.</summary>
    public void Add(CheckEntryResponse reply)
    {
        Interlocked.Increment(ref _replies);
        foreach (var run in reply.RuleRuns)
        {
            _byRule.AddOrUpdate(run.RuleId, (run.ElapsedMs, 1), (_, sum) => (sum.TotalMs + run.ElapsedMs, sum.Runs + 1));
        }
    }

    /// <summary>Mean milliseconds per reply, by rule id, and their sum; empty before any reply.</summary>
    public ServerTimeFigures Figures()
    {
        var replies = Math.Max(1, Volatile.Read(ref _replies));
        var byRule = _byRule.OrderBy(r => r.Key, StringComparer.Ordinal)
            .ToDictionary(r => r.Key, r => CallFigures.Round(r.Value.TotalMs / replies), StringComparer.Ordinal);
        return new ServerTimeFigures(_replies, CallFigures.Round(byRule.Values.Sum()), byRule);
    }
}

/// <summary>Mean rule time per CheckEntry reply, as the host reported it.</summary>
/// <param name="Replies">Replies the means are over.</param>
/// <param name="RulesMsPerEntry">Sum of the rules' elapsed time per entry, ms.</param>
/// <param name="MsPerEntryByRule">Each rule's mean elapsed time per entry, ms.</param>
public sealed record ServerTimeFigures(int Replies, double RulesMsPerEntry, IReadOnlyDictionary<string, double> MsPerEntryByRule);
