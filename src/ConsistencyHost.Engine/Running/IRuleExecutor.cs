using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Running;

/// <summary>
/// Runs the rules of untrusted plugins outside the host process. The engine knows no transport: the gRPC
/// host and the command line hand it an implementation (a worker-process supervisor); without one, every
/// rule runs in-process.
/// </summary>
public interface IRuleExecutor
{
    /// <summary>
    /// The longest a run may take beyond the rule's own deadline (starting or restarting a worker, killing
    /// one that overran). The runner waits deadline plus this before it gives up on the executor itself.
    /// </summary>
    TimeSpan Overhead { get; }

    /// <summary>
    /// Runs one rule on one entry. The rule's misbehaviour (a throw, an overrun, a crash, a quarantine) is
    /// the result's status, never an exception.
    /// </summary>
    /// <param name="rule">The rule with its options and deadline.</param>
    /// <param name="submission">The entry as submitted; the executor's side reads it with the same intake.</param>
    /// <param name="cancellationToken">Cancelled when the request is abandoned.</param>
    Task<ExecutorResult> RunAsync(ActiveRule rule, EntrySubmission submission, CancellationToken cancellationToken);

    /// <summary>
    /// Describes an untrusted plugin without loading it in the host: a worker loads it, reports its rules'
    /// metadata and option schema, and binds and validates each profile's options for them. A plugin whose
    /// worker fails, crashes or times out comes back as one refused descriptor with the reason, never an exception.
    /// </summary>
    /// <param name="assemblyPath">The plugin's main assembly, already vetted by the host through its metadata.</param>
    /// <param name="plugin">The plugin's name as discovery lists it (file name, or "Name (source)").</param>
    /// <param name="profiles">The profiles whose options are bound for each rule.</param>
    /// <param name="cancellationToken">Cancelled when the host gives up starting.</param>
    Task<IReadOnlyList<RuleDescriptor>> DescribeAsync(string assemblyPath, string plugin, IReadOnlyList<Profile> profiles, CancellationToken cancellationToken);

    /// <summary>
    /// Where source plugins are compiled, bounded in time and memory (a worker process); null compiles them in the
    /// host process, where only the time is bounded. Null by default.
    /// </summary>
    Vetting.ISourceCompilation? SourceCompilation => null;

    /// <summary>
    /// Why this executor cannot run untrusted plugins on this machine with the isolation it promises (e.g. the host
    /// cannot give workers a uid of their own), naming what is missing; null when it can. Discovery then refuses every
    /// untrusted plugin with this reason instead of running it any less isolated. Null by default.
    /// </summary>
    string? UnavailableReason => null;

    /// <summary>Why the rule is currently held back (its plugin is quarantined), or null when it can run.</summary>
    string? HeldBackReason(RuleDescriptor rule);

    /// <summary>
    /// A rule of this executor's went past the report limits (<see cref="ReportLimits"/>); an executor counts it
    /// toward quarantining the plugin, as it counts a crash. Does nothing by default.
    /// </summary>
    void ReportOverLimit(RuleDescriptor rule, string reason)
    {
    }
}

/// <summary>What an executor reports for one run; findings carry the rule's own severities.</summary>
public sealed record ExecutorResult(RuleRunStatus Status, string Message, IReadOnlyList<Finding> Findings);
