using System.Text.Json;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests;

/// <summary><c>consistencyhost --version</c> prints what a running host reports in ListRules.</summary>
public sealed class VersionCommandTests
{
    [Fact]
    public async Task Version_PrintsTheVersionsARunningHostReports()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("--version");
        using var host = await ServeProcess.StartAsync();
        using var http = new HttpClient { BaseAddress = host.Http, Timeout = TimeSpan.FromSeconds(60) };
        using var rules = JsonDocument.Parse(await http.GetStringAsync("/v1/rules"));

        Assert.True(exit == 0, stderr);
        var lines = stdout.TrimEnd('\n').Split('\n');
        Assert.Equal(
            [$"consistencyhost {rules.RootElement.GetProperty("hostVersion").GetString()}", $"engine {rules.RootElement.GetProperty("engineVersion").GetString()}"],
            lines);
        // Semantic versioning 2.0.0: MAJOR.MINOR.PATCH, optionally "+build metadata" (the source revision).
        Assert.All(lines, line => Assert.Matches(@"^\S+ \d+\.\d+\.\d+([-+]\S+)?$", line));
    }
}
