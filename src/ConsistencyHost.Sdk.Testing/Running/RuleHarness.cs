using System.Reflection;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Sdk.Testing.Running;

/// <summary>
/// Runs one rule on one entry the way the host does: options bound from text by option name (as a profile
/// gives them) and validated, the rule run on the thread pool under a deadline, an exception turned into a
/// <see cref="RuleRunStatus.Failed"/> run and an overrun into <see cref="RuleRunStatus.TimedOut"/>.
/// </summary>
public static class RuleHarness
{
    /// <summary>The host's default per-rule deadline.</summary>
    public static readonly TimeSpan DefaultDeadline = TimeSpan.FromSeconds(2);

    /// <summary>Runs a new <typeparamref name="TRule"/>.</summary>
    public static RuleRun Run<TRule>(IEntryView entry, IReadOnlyDictionary<string, string>? options = null, TimeSpan? deadline = null)
        where TRule : IRule, new() => Run(new TRule(), entry, options, deadline);

    /// <summary>
    /// Runs <paramref name="rule"/>. Throws <see cref="ArgumentException"/> listing every problem when the
    /// rule has no [Rule] metadata or the options do not bind: that is a mistake in the test, not a finding.
    /// </summary>
    public static RuleRun Run(IRule rule, IEntryView entry, IReadOnlyDictionary<string, string>? options = null, TimeSpan? deadline = null)
    {
        var metadata = rule.GetType().GetCustomAttribute<RuleAttribute>()
                       ?? throw new ArgumentException($"{rule.GetType().Name} has no [Rule] metadata; the host would refuse it.", nameof(rule));
        var (bound, problems) = OptionsBinder.Bind(rule.OptionsType, options ?? new Dictionary<string, string>());
        if (bound is null)
        {
            throw new ArgumentException($"Options for rule '{metadata.Id}' do not bind: " + string.Join("; ", problems), nameof(options));
        }

        return Execute(metadata.Id, rule, entry, bound, deadline ?? DefaultDeadline);
    }

    private static RuleRun Execute(string id, IRule rule, IEntryView entry, object options, TimeSpan deadline)
    {
        using var cancellation = new CancellationTokenSource(deadline);
        var token = cancellation.Token;
        var run = Task.Run(() => Collect(rule, entry, options, token), CancellationToken.None);
        try
        {
            // The same small grace as the host: a rule that observes cancellation needs a moment to unwind.
            if (!run.Wait(deadline + TimeSpan.FromMilliseconds(50)))
            {
                return new RuleRun(id, RuleRunStatus.TimedOut, [], null);
            }
        }
        catch (AggregateException failure) when (failure.GetBaseException() is OperationCanceledException && token.IsCancellationRequested)
        {
            return new RuleRun(id, RuleRunStatus.TimedOut, [], null);
        }
        catch (AggregateException failure)
        {
            return new RuleRun(id, RuleRunStatus.Failed, [], failure.GetBaseException());
        }

        return new RuleRun(id, RuleRunStatus.Ok, run.Result, null);
    }

    private static List<Finding> Collect(IRule rule, IEntryView entry, object options, CancellationToken token)
    {
        var findings = new List<Finding>();
        foreach (var finding in rule.Check(entry, options, token))
        {
            token.ThrowIfCancellationRequested();
            findings.Add(finding);
        }

        return findings;
    }
}
