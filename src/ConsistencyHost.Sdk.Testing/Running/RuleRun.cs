using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Sdk.Testing.Running;

/// <summary>The outcome of running one rule on one entry.</summary>
/// <param name="RuleId">The id from the rule's [Rule] metadata.</param>
/// <param name="Status">How the run ended.</param>
/// <param name="Findings">The findings, in the order the rule yielded them; empty unless <see cref="RuleRunStatus.Ok"/>.</param>
/// <param name="Error">The exception of a failed run; null otherwise.</param>
public sealed record RuleRun(string RuleId, RuleRunStatus Status, IReadOnlyList<Finding> Findings, Exception? Error);
