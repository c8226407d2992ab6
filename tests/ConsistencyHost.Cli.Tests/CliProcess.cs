using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests;

/// <summary>Runs the built command-line tool as a child process, the way a script would.</summary>
internal static class CliProcess
{
    /// <summary>The CLI's output folder, built in the same configuration as the tests.</summary>
    public static string Directory => RepoPaths.Cli;

    public static Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(params string[] args) =>
        ChildProcess.RunAsync("dotnet", [Path.Combine(Directory, "consistencyhost.dll"), .. args], RepoPaths.Root);

    /// <summary>As <see cref="RunAsync(string[])"/>, with extra environment variables.</summary>
    public static Task<(int ExitCode, string Stdout, string Stderr)> RunWithEnvironmentAsync(IReadOnlyDictionary<string, string> environment, params string[] args) =>
        ChildProcess.RunAsync("dotnet", [Path.Combine(Directory, "consistencyhost.dll"), .. args], RepoPaths.Root, environment: environment);
}
