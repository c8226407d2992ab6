using System.ComponentModel.DataAnnotations;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Options;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Testing.Tests;

public sealed record CountOptions : RuleOptions
{
    [Range(1, 100)]
    public int MaxSignals { get; init; } = 10;
}

/// <summary>Reports a 1H list with more signals than allowed.</summary>
[Rule("kit-signal-limit", "1.0.0", "A 1H list has at most MaxSignals signals")]
public sealed class SignalLimitRule : Rule<CountOptions>
{
    public const string TooMany = "too-many-signals";

    protected override IEnumerable<Finding> Check(IEntryView entry, CountOptions options, CancellationToken cancellationToken)
    {
        foreach (var spectrum in entry.Spectra.Where(s => s.Nucleus == Nucleus.H1))
        {
            cancellationToken.ThrowIfCancellationRequested();
            if (spectrum.Signals.Count > options.MaxSignals)
            {
                yield return new Finding(TooMany, Severity.Warning, $"{spectrum.Signals.Count} signals, at most {options.MaxSignals} expected.");
            }
        }
    }
}

[Rule("kit-throws", "1.0.0", "Throws")]
public sealed class ThrowsRule : Rule<NoOptions>
{
    protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken cancellationToken) =>
        throw new InvalidOperationException("broken on purpose");
}

[Rule("kit-spins", "1.0.0", "Spins until cancelled")]
public sealed class SpinsRule : Rule<NoOptions>
{
    protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken cancellationToken)
    {
        while (true)
        {
            cancellationToken.ThrowIfCancellationRequested();
        }
    }
}

public sealed class UnlabelledRule : Rule<NoOptions>
{
    protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken cancellationToken) => [];
}
