using System.Text.Json;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests;

/// <summary>The check command's contract: flags, exit codes and the JSON fields integrators read.</summary>
public sealed class CheckCommandTests
{
    private static string Sample(string name) => Path.Combine(RepoPaths.Samples, "entries", name);

    [Fact]
    public async Task Check_SampleWithMissingSolvent_PrintsFindingAndExitsZero()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("check", Sample("AIS-LQ-0422.json"));

        Assert.True(exit == 0, stderr);
        Assert.Contains("spectrum-metadata/solvent-not-stated", stdout, StringComparison.Ordinal);
        Assert.Contains("screening aids for a qualified chemist", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Check_JsonFormat_PrintsProtoJsonMappingWithContractFields()
    {
        var (exit, stdout, _) = await CliProcess.RunAsync("check", Sample("AIS-LQ-0422.json"), "--format", "json");

        Assert.Equal(0, exit);
        using var json = JsonDocument.Parse(stdout);
        var finding = json.RootElement.GetProperty("findings").EnumerateArray().First(f => f.GetProperty("ruleId").GetString() == "spectrum-metadata");
        Assert.Equal("AIS-LQ-0422", json.RootElement.GetProperty("entryId").GetString());
        Assert.Equal("spectrum-metadata", finding.GetProperty("ruleId").GetString());
        Assert.Equal("solvent-not-stated", finding.GetProperty("code").GetString());
        Assert.Equal("warning", finding.GetProperty("severity").GetString());
        Assert.True(finding.TryGetProperty("message", out _));
        Assert.Equal(JsonValueKind.Array, finding.GetProperty("atoms").ValueKind);
        Assert.Equal(JsonValueKind.Array, finding.GetProperty("peaks").ValueKind);
        Assert.Equal(JsonValueKind.Array, finding.GetProperty("evidence").ValueKind);
    }

    [Fact]
    public async Task Check_ProfileRaisesSeverityToError_ExitsOne()
    {
        var config = Path.Combine(Path.GetTempPath(), $"ch-cli-{Guid.NewGuid():N}.json");
        await File.WriteAllTextAsync(config, """
            { "ConsistencyHost": { "Profiles": { "publication": { "Rules": { "spectrum-metadata": { "Severities": { "solvent-not-stated": "error" } } } } } } }
            """);
        try
        {
            var (exit, stdout, _) = await CliProcess.RunAsync("check", Sample("AIS-LQ-0422.json"), "--config", config, "--profile", "publication");

            Assert.Equal(1, exit);
            Assert.Contains("ERROR", stdout, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(config);
        }
    }

    [Theory]
    [InlineData("entry file 'no-such-entry.json' does not exist", "check", "no-such-entry.json")]
    [InlineData("unknown option '--colour'", "check", "--colour", "red")]
    [InlineData("--format must be text or json, not 'xml'", "check", "--format", "xml")]
    [InlineData("profile: unknown profile 'nope'", "check", "--profile", "nope")]
    [InlineData("unknown command 'verify'", "verify")]
    public async Task Check_UnusableInput_ExitsTwoWithReasonOnStderrOnly(string expected, params string[] args)
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync(args);

        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Contains(expected, stderr, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Rules_BuiltInPlugins_ListsSpectrumMetadata()
    {
        var (exit, stdout, _) = await CliProcess.RunAsync("rules", "--format", "json");

        Assert.Equal(0, exit);
        using var json = JsonDocument.Parse(stdout);
        Assert.Contains(json.RootElement.GetProperty("rules").EnumerateArray(), r => r.GetProperty("id").GetString() == "spectrum-metadata");
    }
}
