using System.Text.Json;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine;
using ConsistencyHost.Server.Hosting;
using ConsistencyHost.Server.Tests.Isolation;
using ConsistencyHost.Tests.Shared;
using Google.Protobuf;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// ListProfiles (gRPC) and GET /v1/profiles (JSON port) against the real host started with a real configuration
/// file: every profile with what its file states, held to the file as read independently here; and ListRules'
/// versions.
/// </summary>
public sealed class ListProfilesTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);
    private static readonly string[] Rules =
    [
        "ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Rules.SolventResidual", "ConsistencyHost.Rules.SignalCount", "ConsistencyHost.Rules.MassFormula",
        "ConsistencyHost.Rules.CouplingPartners", "ConsistencyHost.Rules.IntegralRatio",
    ];

    [Fact]
    public async Task ListProfiles_SamplePublicationFile_ListsWhatTheFileStates()
    {
        var file = Path.Combine(RepoPaths.Samples, "profiles", "publication.json");
        await using var host = await RunningHost.StartAsync(Rules, file);
        using var config = JsonDocument.Parse(await File.ReadAllTextAsync(file));
        var section = config.RootElement.GetProperty("ConsistencyHost");
        var stated = section.GetProperty("Profiles").GetProperty("publication");

        var list = await new EntryCheck.EntryCheckClient(host.Channel).ListProfilesAsync(new ListProfilesRequest(), deadline: DateTime.UtcNow + CallTimeout);

        Assert.Equal(section.GetProperty("DefaultProfile").GetString(), list.DefaultProfile);
        // The file names one profile; the host adds "default" (every rule at its defaults) when none has that name.
        Assert.Equal(["default", "publication"], list.Profiles.Select(p => p.Name));
        var publication = list.Profiles[1];
        Assert.True(publication.IsDefault);
        Assert.Equal(stated.GetProperty("Description").GetString(), publication.Description);
        Assert.Equal(stated.GetProperty("Rules").EnumerateObject().Select(r => r.Name).Order(StringComparer.Ordinal), publication.Rules.Select(r => r.RuleId));
        foreach (var rule in stated.GetProperty("Rules").EnumerateObject())
        {
            var listed = publication.Rules.Single(r => r.RuleId == rule.Name);
            Assert.Equal(Map(rule.Value, "Options"), listed.Options.OrderBy(o => o.Key, StringComparer.Ordinal).Select(o => $"{o.Key}={o.Value}"));
            Assert.Equal(Map(rule.Value, "Severities"), listed.Severities.OrderBy(o => o.Key, StringComparer.Ordinal).Select(o => $"{o.Key}={o.Value.ToString().ToLowerInvariant()}"));
            Assert.Equal(rule.Value.TryGetProperty("DeadlineMs", out var deadline) ? deadline.GetInt32() : 0, listed.DeadlineMs);
        }

        // Nothing is disabled, so every loaded rule runs under both profiles.
        var loaded = (await new EntryCheck.EntryCheckClient(host.Channel).ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout))
            .Rules.Where(r => r.LoadStatus == RuleLoadStatus.Loaded).Select(r => r.Id).Order(StringComparer.Ordinal);
        Assert.All(list.Profiles, p => Assert.Equal(loaded, p.ActiveRules));
        Assert.Equal(("", false), (list.Profiles[0].Description, list.Profiles[0].IsDefault));
    }

    [Fact]
    public async Task ListProfiles_OnlyListedAndDisabledRules_ActiveRulesFollowThem()
    {
        using var config = await HostileConfig.WriteAsync("""
            { "ConsistencyHost": { "Profiles": {
                "headers-only": { "OnlyListedRules": true, "StrictText": true,
                  "Rules": { "spectrum-metadata": { "DeadlineMs": 500 }, "signal-count": { "Enabled": false } } },
                "no-solvent-lines": { "Rules": { "solvent-residual": { "Enabled": false } } } } } }
            """);
        await using var host = await RunningHost.StartAsync(Rules, config.Path);

        var list = await new EntryCheck.EntryCheckClient(host.Channel).ListProfilesAsync(new ListProfilesRequest(), deadline: DateTime.UtcNow + CallTimeout);

        var headers = list.Profiles.Single(p => p.Name == "headers-only");
        Assert.Equal((true, true), (headers.OnlyListedRules, headers.StrictText));
        Assert.Equal(["spectrum-metadata"], headers.ActiveRules);
        Assert.Equal([("signal-count", false, 0), ("spectrum-metadata", true, 500)], headers.Rules.Select(r => (r.RuleId, r.Enabled, r.DeadlineMs)));
        Assert.DoesNotContain("solvent-residual", list.Profiles.Single(p => p.Name == "no-solvent-lines").ActiveRules);
        Assert.Contains("solvent-residual", list.Profiles.Single(p => p.Name == "default").ActiveRules);
    }

    [Fact]
    public async Task ListProfiles_JsonPort_AnswersTheSameAsGrpc()
    {
        await using var host = await RunningHost.StartAsync(Rules, Path.Combine(RepoPaths.Samples, "profiles", "screening.json"));
        using var http = new HttpClient { BaseAddress = host.HttpAddress, Timeout = CallTimeout };

        var viaHttp = JsonParser.Default.Parse<ListProfilesResponse>(await http.GetStringAsync("/v1/profiles"));
        var viaGrpc = await new EntryCheck.EntryCheckClient(host.Channel).ListProfilesAsync(new ListProfilesRequest(), deadline: DateTime.UtcNow + CallTimeout);

        Assert.Equal(viaGrpc, viaHttp);
        Assert.Equal("screening", viaHttp.DefaultProfile);
    }

    [Fact]
    public async Task ListRules_ReportsHostAndEngineVersions()
    {
        await using var host = await RunningHost.StartAsync(Rules);

        var list = await new EntryCheck.EntryCheckClient(host.Channel).ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);

        // Semantic versioning 2.0.0: MAJOR.MINOR.PATCH, optionally "+build metadata" (here the source revision).
        Assert.Matches(@"^\d+\.\d+\.\d+([-+].+)?$", list.HostVersion);
        Assert.Matches(@"^\d+\.\d+\.\d+([-+].+)?$", list.EngineVersion);
        Assert.Equal((ServerApp.Version, BuildVersion.Engine), (list.HostVersion, list.EngineVersion));
    }

    private static IEnumerable<string> Map(JsonElement rule, string name) => rule.TryGetProperty(name, out var map)
        ? map.EnumerateObject().OrderBy(p => p.Name, StringComparer.Ordinal).Select(p => $"{p.Name}={p.Value.GetString()}")
        : [];
}
