namespace ConsistencyHost.Sdk.Rules;

/// <summary>
/// Marks a class as a rule and carries its metadata. The host reads it without running the rule,
/// so the values must be constants.
/// </summary>
/// <param name="id">Stable id: lower-case letters and digits in words joined by single hyphens, e.g. "signal-count".</param>
/// <param name="version">Semantic version "major.minor.patch" of the rule's behaviour.</param>
/// <param name="title">One line for people, e.g. "Every spectrum states its solvent and frequency".</param>
[AttributeUsage(AttributeTargets.Class, AllowMultiple = false, Inherited = false)]
public sealed class RuleAttribute(string id, string version, string title) : Attribute
{
    /// <summary>The rule id.</summary>
    public string Id { get; } = id;

    /// <summary>The rule version.</summary>
    public string Version { get; } = version;

    /// <summary>The rule title.</summary>
    public string Title { get; } = title;

    /// <summary>Nuclei whose spectra the rule needs ("1H", "13C"); empty when it needs none.</summary>
    public string[] Nuclei { get; init; } = [];
}
