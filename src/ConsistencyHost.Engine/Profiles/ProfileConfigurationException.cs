namespace ConsistencyHost.Engine.Profiles;

/// <summary>The configured profiles cannot be used; <see cref="Problems"/> lists every reason.</summary>
public sealed class ProfileConfigurationException(IReadOnlyList<string> problems)
    : Exception("Invalid profile configuration:" + Environment.NewLine + string.Join(Environment.NewLine, problems.Select(p => "  - " + p)))
{
    /// <summary>Every problem found, one sentence each.</summary>
    public IReadOnlyList<string> Problems { get; } = problems;
}
