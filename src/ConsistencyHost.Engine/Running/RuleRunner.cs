using System.Collections.Concurrent;
using System.Diagnostics;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Engine.Telemetry;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Running;

/// <summary>
/// Runs the rules of a profile on one entry. Trusted rules (shipped with the host) run one after another on
/// the calling thread with a cooperative deadline; other in-process rules run on the thread pool with their
/// own deadline; untrusted ones go to the <see cref="IRuleExecutor"/> when there is one. An exception becomes
/// <see cref="RuleRunStatus.Failed"/>, an overrun <see cref="RuleRunStatus.TimedOut"/>, and the other rules'
/// findings are kept.
/// </summary>
/// <remarks>
/// Trusted rules run inline because a thread-pool hop, a wait and a timer per rule cost more than the rules
/// themselves under load (bench/: several milliseconds per entry on a busy 2-core machine against well under a
/// millisecond of rule work); their deadline is cooperative — a trusted rule that overruns is reported
/// timed out when it returns. An in-process rule that ignores cancellation cannot be stopped: its thread runs on after the deadline.
/// So that a runaway rule cannot eat the thread pool, a rule whose previous run is still going is skipped
/// until that run ends. Untrusted plugins belong in a worker process, where an overrun kills the process.
/// </remarks>
public sealed class RuleRunner(IRuleExecutor? isolated = null, ReportLimits? limits = null)
{
    private readonly ReportLimits _limits = limits ?? ReportLimits.Default;

    /// <summary>How long an in-process rule may wait for a pool thread before the request gives up on it.</summary>
    private static readonly TimeSpan StartAllowance = TimeSpan.FromSeconds(10);

    private readonly ConcurrentDictionary<string, Task> _runaways = new(StringComparer.Ordinal);

    /// <summary>True when the rule goes to the worker executor rather than the thread pool.</summary>
    public bool RunsIsolated(ActiveRule rule) => isolated is not null && !rule.Descriptor.IsTrusted;

    /// <summary>Runs every active rule and collects findings and run records.</summary>
    public (IReadOnlyList<ReportedFinding> Findings, IReadOnlyList<RuleRunRecord> Runs) Run(
        IEntryView entry, EntrySubmission submission, ResolvedProfile profile, CancellationToken cancellationToken)
    {
        var started = profile.Rules.Select(rule => (Rule: rule, Run: Start(rule, entry, submission, cancellationToken))).ToList();
        var findings = new List<ReportedFinding>();
        var runs = new List<RuleRunRecord>(started.Count);
        foreach (var (rule, run) in started)
        {
            var (ran, all) = run.IsInline ? RunInline(rule, entry, cancellationToken) : Await(rule, run);
            var (record, produced, cut) = _limits.Apply(ran, all, started.Count);
            if (cut is not null && RunsIsolated(rule)) isolated!.ReportOverLimit(rule.Descriptor, cut);
            runs.Add(record);
            EngineTelemetry.RuleEnded(record);
            findings.AddRange(produced);
        }

        return (findings, runs);
    }

    private StartedRun Start(ActiveRule rule, IEntryView entry, EntrySubmission submission, CancellationToken cancellationToken)
    {
        if (RuleApplicability.SkipReason(rule.Descriptor, entry) is { } nothingToCheck)
        {
            return StartedRun.Skipped(nothingToCheck);
        }

        if (RunsIsolated(rule))
        {
            var started = Stopwatch.StartNew();
            var run = isolated!.RunAsync(rule, submission, cancellationToken);
            _ = run.ContinueWith(_ => started.Stop(), CancellationToken.None, TaskContinuationOptions.ExecuteSynchronously, TaskScheduler.Default);
            return new StartedRun(null, null, started, null, run);
        }

        if (rule.Descriptor.IsTrusted)
        {
            return StartedRun.Inline;
        }

        if (_runaways.TryGetValue(rule.Descriptor.Id, out var previous) && !previous.IsCompleted)
        {
            return StartedRun.Skipped("its previous run overran its deadline and is still running");
        }

        var deadline = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        var clock = new Stopwatch();
        var began = new ManualResetEventSlim();
        // Take the token now: the source is disposed after the wait, possibly before a queued task starts.
        var token = deadline.Token;
        // The deadline and the clock start when the rule starts, not when it is queued: on a busy host a task
        // can wait seconds for a pool thread, and that wait is not the rule's doing. The clock stops when the
        // rule returns, so a rule awaited after a slow one reports its own time. Each such run gets a thread of its
        // own (LongRunning) rather than a pool thread: the caller blocks waiting for it, and under load (a fresh-clone
        // CI run, 5 Dec 2026) the pool did not grow fast enough, so a 1 ms rule "did not get a thread" in 10 s.
        var task = Task.Factory.StartNew(() =>
        {
            try
            {
                clock.Start();
                deadline.CancelAfter(rule.Deadline);
                began.Set();
                return Execute(rule, entry, token);
            }
            catch (ObjectDisposedException) when (token.IsCancellationRequested)
            {
                // The request gave up on this rule before it started (see StartAllowance).
                throw new OperationCanceledException(token);
            }
            finally
            {
                clock.Stop();
            }
        }, CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default);
        return new StartedRun(task, deadline, clock, null, null, began);
    }

    /// <summary>Runs a trusted rule on the calling thread; an overrun is found when it returns.</summary>
    private static (RuleRunRecord Record, IReadOnlyList<ReportedFinding> Findings) RunInline(ActiveRule rule, IEntryView entry, CancellationToken cancellationToken)
    {
        var (id, version) = (rule.Descriptor.Id, rule.Descriptor.Version);
        var clock = Stopwatch.StartNew();
        using var deadline = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        deadline.CancelAfter(rule.Deadline);
        try
        {
            var produced = Execute(rule, entry, deadline.Token);
            if (clock.Elapsed <= rule.Deadline)
            {
                var findings = produced.Select(f => Stamp(rule, f)).ToList();
                return (new RuleRunRecord(id, version, RuleRunStatus.Ok, clock.Elapsed, "", findings.Count), findings);
            }
        }
        catch (OperationCanceledException) when (deadline.IsCancellationRequested && !cancellationToken.IsCancellationRequested)
        {
            // Fall through to the timed-out record below.
        }
        catch (Exception error) when (error is not OutOfMemoryException && (error is not OperationCanceledException || !cancellationToken.IsCancellationRequested))
        {
            // Includes an OperationCanceledException the rule threw of its own accord before its deadline: a failure, not a time-out.
            return (new RuleRunRecord(id, version, RuleRunStatus.Failed, clock.Elapsed, $"{error.GetType().Name}: {error.Message}", 0), []);
        }

        return (new RuleRunRecord(id, version, RuleRunStatus.TimedOut, clock.Elapsed, $"overran its deadline of {rule.Deadline.TotalMilliseconds:0} ms", 0), []);
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

    private (RuleRunRecord Record, IReadOnlyList<ReportedFinding> Findings) Await(ActiveRule rule, StartedRun run)
    {
        var id = rule.Descriptor.Id;
        var version = rule.Descriptor.Version;
        if (run.SkipReason is not null)
        {
            return (new RuleRunRecord(id, version, RuleRunStatus.Skipped, TimeSpan.Zero, run.SkipReason, 0), []);
        }

        if (run.Isolated is not null)
        {
            return AwaitIsolated(rule, run.Isolated, run.Clock!);
        }

        using var deadline = run.Deadline!;
        using var began = run.Began!;
        if (!began.Wait(StartAllowance))
        {
            deadline.Cancel();
            if (!run.Task!.IsCompleted) _runaways[id] = run.Task;
            return (new RuleRunRecord(id, version, RuleRunStatus.TimedOut, TimeSpan.Zero,
                $"did not get a thread within {StartAllowance.TotalSeconds:0} s; the host is overloaded", 0), []);
        }

        // Measured from the rule's own start, with a little grace for a rule that observes cancellation to unwind.
        var remaining = rule.Deadline - run.Clock!.Elapsed + TimeSpan.FromMilliseconds(50);
        var finished = WaitQuietly(run.Task!, remaining > TimeSpan.Zero ? remaining : TimeSpan.Zero);
        var elapsed = run.Clock!.Elapsed;
        if (!finished || (run.Task!.IsCanceled && deadline.IsCancellationRequested))
        {
            if (!run.Task!.IsCompleted) _runaways[id] = run.Task;
            return (new RuleRunRecord(id, version, RuleRunStatus.TimedOut, elapsed, $"overran its deadline of {rule.Deadline.TotalMilliseconds:0} ms", 0), []);
        }

        if (run.Task!.IsFaulted && run.Task.Exception!.GetBaseException() is OperationCanceledException && deadline.IsCancellationRequested)
        {
            // The rule observed its token when the deadline fired (a task started without the token reports that as a fault).
            return (new RuleRunRecord(id, version, RuleRunStatus.TimedOut, elapsed, $"overran its deadline of {rule.Deadline.TotalMilliseconds:0} ms", 0), []);
        }

        if (run.Task!.IsFaulted)
        {
            // Any other exception, an OperationCanceledException the rule threw of its own accord included, is a failure.
            var error = run.Task.Exception!.GetBaseException();
            return (new RuleRunRecord(id, version, RuleRunStatus.Failed, elapsed, $"{error.GetType().Name}: {error.Message}", 0), []);
        }

        var findings = run.Task.Result.Select(f => Stamp(rule, f)).ToList();
        return (new RuleRunRecord(id, version, RuleRunStatus.Ok, elapsed, "", findings.Count), findings);
    }

    private (RuleRunRecord Record, IReadOnlyList<ReportedFinding> Findings) AwaitIsolated(ActiveRule rule, Task<ExecutorResult> task, Stopwatch clock)
    {
        var (id, version) = (rule.Descriptor.Id, rule.Descriptor.Version);
        // The executor enforces the deadline itself (by killing its worker); this wait only guards against
        // an executor that breaks its own promise.
        if (!WaitQuietly(task, rule.Deadline + isolated!.Overhead))
        {
            return (new RuleRunRecord(id, version, RuleRunStatus.TimedOut, clock.Elapsed, "the worker executor did not answer in time", 0), []);
        }

        if (!task.IsCompletedSuccessfully)
        {
            var error = task.Exception?.GetBaseException();
            return (new RuleRunRecord(id, version, RuleRunStatus.Failed, clock.Elapsed, $"worker executor error: {error?.Message ?? "cancelled"}", 0), []);
        }

        var result = task.Result;
        var findings = result.Status == RuleRunStatus.Ok ? result.Findings.Select(f => Stamp(rule, f)).ToList() : [];
        return (new RuleRunRecord(id, version, result.Status, clock.Elapsed, result.Message, findings.Count), findings);
    }

    private static bool WaitQuietly(Task task, TimeSpan limit)
    {
        try
        {
            // The caller adds a little grace: a rule that observes cancellation needs a moment to unwind.
            return task.Wait(limit);
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

    private sealed record StartedRun(
        Task<List<Finding>>? Task, CancellationTokenSource? Deadline, Stopwatch? Clock, string? SkipReason, Task<ExecutorResult>? Isolated,
        ManualResetEventSlim? Began = null)
    {
        /// <summary>A trusted rule, run when its turn comes.</summary>
        public static StartedRun Inline { get; } = new(null, null, null, null, null);

        public bool IsInline => ReferenceEquals(this, Inline);

        public static StartedRun Skipped(string reason) => new(null, null, null, reason, null);
    }
}
