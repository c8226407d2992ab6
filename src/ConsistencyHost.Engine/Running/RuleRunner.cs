using System.Collections.Concurrent;
using System.Diagnostics;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Running;

/// <summary>
/// Runs the rules of a profile on one entry. Each rule runs on the thread pool with its own deadline; an
/// exception becomes <see cref="RuleRunStatus.Failed"/>, an overrun <see cref="RuleRunStatus.TimedOut"/>,
/// and the other rules' findings are kept.
/// </summary>
/// <remarks>
/// An in-process rule that ignores cancellation cannot be stopped: its thread runs on after the deadline.
/// So that a runaway rule cannot eat the thread pool, a rule whose previous run is still going is skipped
/// until that run ends. Untrusted plugins belong in a worker process, where an overrun kills the process.
/// </remarks>
public sealed class RuleRunner
{
    private readonly ConcurrentDictionary<string, Task> _runaways = new(StringComparer.Ordinal);

    /// <summary>Runs every active rule and collects findings and run records.</summary>
    public (IReadOnlyList<ReportedFinding> Findings, IReadOnlyList<RuleRunRecord> Runs) Run(
        IEntryView entry, ResolvedProfile profile, CancellationToken cancellationToken)
    {
        var started = profile.Rules.Select(rule => (Rule: rule, Run: Start(rule, entry, cancellationToken))).ToList();
        var findings = new List<ReportedFinding>();
        var runs = new List<RuleRunRecord>(started.Count);
        foreach (var (rule, run) in started)
        {
            var (record, produced) = Await(rule, run);
            runs.Add(record);
            findings.AddRange(produced);
        }

        return (findings, runs);
    }

    private StartedRun Start(ActiveRule rule, IEntryView entry, CancellationToken cancellationToken)
    {
        if (_runaways.TryGetValue(rule.Descriptor.Id, out var previous) && !previous.IsCompleted)
        {
            return StartedRun.Skipped("its previous run overran its deadline and is still running");
        }

        var deadline = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        deadline.CancelAfter(rule.Deadline);
        var clock = Stopwatch.StartNew();
        // Take the token now: the source is disposed after the wait, possibly before a queued task starts.
        var token = deadline.Token;
        var task = Task.Run(() => Execute(rule, entry, token), CancellationToken.None);
        return new StartedRun(task, deadline, clock, null);
    }

    private static List<Finding> Execute(ActiveRule rule, IEntryView entry, CancellationToken token)
    {
        var instance = rule.Descriptor.Factory!();
        var list = new List<Finding>();
        foreach (var finding in instance.Check(entry, rule.Options, token))
        {
            token.ThrowIfCancellationRequested();
            list.Add(finding);
        }

        return list;
    }

    private (RuleRunRecord Record, IEnumerable<ReportedFinding> Findings) Await(ActiveRule rule, StartedRun run)
    {
        var id = rule.Descriptor.Id;
        var version = rule.Descriptor.Version;
        if (run.SkipReason is not null)
        {
            return (new RuleRunRecord(id, version, RuleRunStatus.Skipped, TimeSpan.Zero, run.SkipReason, 0), []);
        }

        using var deadline = run.Deadline!;
        var finished = WaitQuietly(run.Task!, rule.Deadline);
        var elapsed = run.Clock!.Elapsed;
        if (!finished || (run.Task!.IsCanceled && deadline.IsCancellationRequested))
        {
            if (!run.Task!.IsCompleted) _runaways[id] = run.Task;
            return (new RuleRunRecord(id, version, RuleRunStatus.TimedOut, elapsed, $"overran its deadline of {rule.Deadline.TotalMilliseconds:0} ms", 0), []);
        }

        if (run.Task!.IsFaulted)
        {
            var error = run.Task.Exception!.GetBaseException();
            return (new RuleRunRecord(id, version, RuleRunStatus.Failed, elapsed, $"{error.GetType().Name}: {error.Message}", 0), []);
        }

        var findings = run.Task.Result.Select(f => Stamp(rule, f)).ToList();
        return (new RuleRunRecord(id, version, RuleRunStatus.Ok, elapsed, "", findings.Count), findings);
    }

    private static bool WaitQuietly(Task task, TimeSpan deadline)
    {
        try
        {
            // A little grace over the deadline: a rule that observes cancellation needs a moment to unwind.
            return task.Wait(deadline + TimeSpan.FromMilliseconds(50));
        }
        catch (AggregateException)
        {
            return true;
        }
    }

    private static ReportedFinding Stamp(ActiveRule rule, Finding finding)
    {
        var severity = rule.Severities.TryGetValue(finding.Code, out var overridden) ? overridden : finding.Severity;
        return new ReportedFinding(rule.Descriptor.Id, rule.Descriptor.Version, finding with { Severity = severity });
    }

    private sealed record StartedRun(Task<List<Finding>>? Task, CancellationTokenSource? Deadline, Stopwatch? Clock, string? SkipReason)
    {
        public static StartedRun Skipped(string reason) => new(null, null, null, reason);
    }
}
