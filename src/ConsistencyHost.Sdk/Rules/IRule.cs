using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Sdk.Rules;

/// <summary>
/// The contract between the host and a rule. Implement it through <see cref="Rule{TOptions}"/>, which binds
/// the options type; the host only ever talks to this interface.
/// </summary>
public interface IRule
{
    /// <summary>The options type the rule declares; the host builds and validates an instance per profile.</summary>
    Type OptionsType { get; }

    /// <summary>
    /// Checks one entry. Must be pure: the same entry and options give the same findings, with no I/O,
    /// clock or shared mutable state. Must observe <paramref name="cancellationToken"/>: the host cancels it
    /// at the rule's deadline.
    /// </summary>
    IEnumerable<Finding> Check(IEntryView entry, object options, CancellationToken cancellationToken);
}
