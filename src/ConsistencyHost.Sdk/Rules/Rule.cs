using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Sdk.Rules;

/// <summary>
/// Base class for a rule with an options type. A rule is a sealed class deriving from this, marked with
/// <see cref="RuleAttribute"/>, with a public parameterless constructor.
/// </summary>
/// <typeparam name="TOptions">The options record; its defaults are the rule's documented defaults.</typeparam>
public abstract class Rule<TOptions> : IRule
    where TOptions : RuleOptions, new()
{
    /// <inheritdoc />
    public Type OptionsType => typeof(TOptions);

    /// <inheritdoc />
    public IEnumerable<Finding> Check(IEntryView entry, object options, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(entry);
        if (options is not TOptions typed)
        {
            throw new ArgumentException($"Expected options of type {typeof(TOptions).Name}.", nameof(options));
        }

        return Check(entry, typed, cancellationToken);
    }

    /// <summary>Checks one entry with validated options; see <see cref="IRule.Check"/> for the contract.</summary>
    protected abstract IEnumerable<Finding> Check(IEntryView entry, TOptions options, CancellationToken cancellationToken);
}
