using System.ComponentModel.DataAnnotations;

namespace ConsistencyHost.Sdk.Options;

/// <summary>
/// Base record for a rule's options. Properties are <c>init</c>-only with documented defaults; a profile
/// overrides them by name. Constraints use data-annotation attributes (<see cref="RangeAttribute"/>);
/// cross-field checks go in <see cref="Validate"/>.
/// </summary>
public abstract record RuleOptions
{
    /// <summary>Cross-field validation; yields one message per problem. The default has none.</summary>
    public virtual IEnumerable<string> Validate() => [];
}

/// <summary>Options for a rule that has none.</summary>
public sealed record NoOptions : RuleOptions;
