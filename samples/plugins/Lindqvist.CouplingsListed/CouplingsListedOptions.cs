using ConsistencyHost.Sdk.Options;

namespace Lindqvist.CouplingsListed;

/// <summary>Options of the lindqvist-couplings-listed rule.</summary>
public sealed record CouplingsListedOptions : RuleOptions
{
    /// <summary>
    /// Also report a signal that lists some but not all of its coupling constants ("dd, J = 8.4 Hz").
    /// Default true: the group's policy is one J per letter of the multiplicity.
    /// </summary>
    public bool RequireEveryCoupling { get; init; } = true;

    /// <summary>
    /// Skip broadened signals ("br d"), whose splitting is often not resolved well enough to measure.
    /// Default false: if a signal is called a doublet, its J was measurable.
    /// </summary>
    public bool IgnoreBroadened { get; init; }
}
