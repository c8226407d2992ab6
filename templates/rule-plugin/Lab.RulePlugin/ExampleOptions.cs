using System.ComponentModel.DataAnnotations;
using ConsistencyHost.Sdk.Options;

namespace Lab.RulePlugin;

/// <summary>Options of the rule; a profile sets them by name.</summary>
public sealed record ExampleOptions : RuleOptions
{
    /// <summary>The fewest signals a 1H list may have. Default 1: an empty list is never a full report.</summary>
    [Range(1, 1000)]
    public int MinimumSignals { get; init; } = 1;
}
