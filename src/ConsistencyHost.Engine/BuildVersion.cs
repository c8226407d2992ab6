using System.Reflection;

namespace ConsistencyHost.Engine;

/// <summary>
/// The version a build of an assembly carries: its informational version, which the .NET SDK writes as the project's
/// semantic version followed by "+" and the source revision of the build (when built from a git checkout). The host
/// reports it in ListRules and the command line in <c>--version</c>, so an operator can tell which build answered.
/// </summary>
public static class BuildVersion
{
    /// <summary>The check engine's version.</summary>
    public static string Engine { get; } = Of(typeof(CheckEngine).Assembly);

    /// <summary>The informational version of <paramref name="assembly"/>, else its assembly version.</summary>
    public static string Of(Assembly assembly) =>
        assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion
        ?? assembly.GetName().Version?.ToString()
        ?? "unknown";
}
