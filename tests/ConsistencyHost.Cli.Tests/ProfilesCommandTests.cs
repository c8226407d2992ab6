using System.Text.Json;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests;

/// <summary>The profiles command and the sample profile files under samples/profiles.</summary>
public sealed class ProfilesCommandTests
{
    private static string Sample(string name) => Path.Combine(RepoPaths.Samples, "profiles", name);

    [Fact]
    public async Task Profiles_PublicationSample_ShowsOverridesBesideDefaults()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("profiles", "--config", Sample("publication.json"), "--format", "json");

        Assert.True(exit == 0, stderr);
        using var json = JsonDocument.Parse(stdout);
        var profiles = json.RootElement.GetProperty("profiles").EnumerateArray().ToList();
        Assert.Equal(["publication", "default"], profiles.Select(p => p.GetProperty("name").GetString()));
        Assert.True(profiles[0].GetProperty("isDefault").GetBoolean());
        var rules = profiles[0].GetProperty("rules").EnumerateArray().ToDictionary(r => r.GetProperty("id").GetString()!);
        Assert.Equal("warning", rules["solvent-residual"].GetProperty("severities").GetProperty("impurity-signals").GetString());
        Assert.Equal("true", rules["spectrum-metadata"].GetProperty("options").GetProperty("RequireTemperature").GetString());
        Assert.Equal(3000, rules["mass-formula"].GetProperty("deadlineMs").GetDouble());
        Assert.Equal(2000, rules["signal-count"].GetProperty("deadlineMs").GetDouble());
        // An option the file does not set is shown at the rule's default, the same in both profiles.
        var defaults = profiles[1].GetProperty("rules").EnumerateArray().Single(r => r.GetProperty("id").GetString() == "spectrum-metadata");
        Assert.Equal(
            defaults.GetProperty("options").GetProperty("FrequencyTolerance").GetString(),
            rules["spectrum-metadata"].GetProperty("options").GetProperty("FrequencyTolerance").GetString());
        Assert.Equal("false", defaults.GetProperty("options").GetProperty("RequireTemperature").GetString());
    }

    [Fact]
    public async Task Profiles_ScreeningSample_IsValidAndDefault()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("profiles", "--config", Sample("screening.json"));

        Assert.True(exit == 0, stderr);
        Assert.StartsWith("profile screening (default)\n", stdout, StringComparison.Ordinal);
        Assert.Contains("      ReportImpurities = false\n", stdout, StringComparison.Ordinal);
        Assert.Contains("      severity j-without-partner -> info\n", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Check_PublicationProfile_RaisesReportedResidualLineToError()
    {
        var entry = Path.Combine(RepoPaths.Samples, "entries", "AIS-LQ-0436.json");

        var (defaultExit, defaultOut, _) = await CliProcess.RunAsync("check", entry, "--format", "json");
        var (exit, stdout, stderr) = await CliProcess.RunAsync("check", entry, "--format", "json", "--config", Sample("publication.json"));

        // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 — residual CHCl3 in CDCl3 at 7.26 ppm,
        // the line the entry lists among its compound signals.
        Assert.Equal("warning", Severity(defaultOut, "residual-solvent-reported"));
        Assert.Equal("error", Severity(stdout, "residual-solvent-reported"));
        Assert.Equal("warning", Severity(stdout, "temperature-not-stated"));
        Assert.Equal(1, exit);
        Assert.True(defaultExit is 0 or 1, stderr);
    }

    [Fact]
    public async Task Profiles_MisspelledRuleKey_ExitsTwoNamingTheKeyPath()
    {
        var config = Path.Combine(Path.GetTempPath(), $"ch-profile-{Guid.NewGuid():N}.json");
        await File.WriteAllTextAsync(config, """
            { "ConsistencyHost": { "Profiles": { "strict": { "Rules": {
              "spectrum-metadata": { "Option": { "RequireTemperature": "true" } },
              "signal-counts": { },
              "solvent-residual": { "Severities": { "water-reportd": "error" } } } } } } }
            """);
        try
        {
            var (exit, stdout, stderr) = await CliProcess.RunAsync("profiles", "--config", config);

            Assert.Equal(2, exit);
            Assert.Empty(stdout);
            // Every kind of problem at once: a misspelt key (read from the file), an unknown rule id and an unknown
            // finding code (found against the loaded rules).
            Assert.Contains("ConsistencyHost:Profiles:strict:Rules:spectrum-metadata:Option: unknown key 'Option'", stderr, StringComparison.Ordinal);
            Assert.Contains("profile 'strict': unknown rule id 'signal-counts'", stderr, StringComparison.Ordinal);
            Assert.Contains("unknown finding code 'water-reportd'", stderr, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(config);
        }
    }

    private static string? Severity(string reportJson, string code)
    {
        using var json = JsonDocument.Parse(reportJson);
        return json.RootElement.GetProperty("findings").EnumerateArray()
            .First(f => f.GetProperty("code").GetString() == code).GetProperty("severity").GetString();
    }
}
