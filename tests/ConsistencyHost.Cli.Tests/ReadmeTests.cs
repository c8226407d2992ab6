using System.Text.RegularExpressions;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests;

/// <summary>The README's quick start keeps working: its check command is run exactly as written.</summary>
public sealed partial class ReadmeTests
{
    [GeneratedRegex(@"^dotnet run --project src/ConsistencyHost.Cli -- (check [^\n]+)$", RegexOptions.Multiline)]
    private static partial Regex QuickStartCheck();

    [Fact]
    public async Task QuickStart_CheckCommand_PrintsFindingsForBundledSample()
    {
        var readme = await File.ReadAllTextAsync(Path.Combine(RepoPaths.Root, "README.md"));
        var command = QuickStartCheck().Match(readme);
        Assert.True(command.Success, "README has no quick-start check command");

        var (exit, stdout, stderr) = await CliProcess.RunAsync(command.Groups[1].Value.Split(' '));

        Assert.True(exit is 0 or 1, stderr);
        Assert.Matches(@"(WARNING|ERROR|INFO)\s+[a-z-]+/[a-z0-9-]+", stdout);
    }

    [Fact]
    public void QuickStart_TestCommand_IsTheOneCiRuns()
    {
        var readme = File.ReadAllText(Path.Combine(RepoPaths.Root, "README.md"));
        var ci = File.ReadAllText(Path.Combine(RepoPaths.Root, ".ci", "run"));

        Assert.Contains("dotnet test ConsistencyHost.sln", readme, StringComparison.Ordinal);
        Assert.Contains("dotnet test ConsistencyHost.sln", ci, StringComparison.Ordinal);
    }
}
