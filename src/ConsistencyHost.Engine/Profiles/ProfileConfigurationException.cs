namespace ConsistencyHost.Engine.Profiles;

/// <summary>
/// The host cannot start with its configuration; <see cref="Problems"/> lists every reason. The message's title
/// says what kind of problem it is, so that an unsafe plugin folder or an unreadable file (ownership, permissions)
/// is not presented as a mistake in the profiles.
/// </summary>
public sealed class ProfileConfigurationException(IReadOnlyList<string> problems, string title = ProfileConfigurationException.ProfileTitle)
    : Exception(title + ":" + Environment.NewLine + string.Join(Environment.NewLine, problems.Select(p => "  - " + p)))
{
    /// <summary>Profiles, rule options, severities, engine settings.</summary>
    public const string ProfileTitle = "Invalid profile configuration";

    /// <summary>Host settings outside the profiles (isolation, health, binding, access).</summary>
    public const string HostTitle = "Invalid host configuration";

    /// <summary>Files and folders refused for who owns them or who may write or read them.</summary>
    public const string AccessTitle = "File access refused (ownership or permissions)";

    /// <summary>Every problem found, one sentence each.</summary>
    public IReadOnlyList<string> Problems { get; } = problems;

    /// <summary>What kind of problem: one of the titles above.</summary>
    public string Title { get; } = title;
}
