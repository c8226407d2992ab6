using System.Net;
using System.Text.Json;
using ConsistencyHost.Server.Probes;
using ConsistencyHost.Server.Tests.Isolation;
using Grpc.Health.V1;
using static Grpc.Health.V1.HealthCheckResponse.Types;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>/health/live and /health/ready on the JSON port of the real host, and the gRPC health service beside them.</summary>
public sealed class HealthEndpointTests
{
    private const string Metadata = "ConsistencyHost.Rules.SpectrumMetadata";

    [Fact]
    public async Task Live_HostUp_Returns200WithTheProcessCheck()
    {
        await using var host = await RunningHost.StartAsync([Metadata]);

        var (status, body) = await GetAsync(host, HealthSetup.LivePath);

        Assert.Equal(HttpStatusCode.OK, status);
        Assert.Equal("Healthy", body.GetProperty("status").GetString());
        Assert.Equal(["process"], Checks(body).Select(c => c.GetProperty("name").GetString()));
    }

    [Fact]
    public async Task Ready_AllPluginsLoaded_Returns200ListingEngineEveryRuleAndWorkers()
    {
        await using var host = await RunningHost.StartAsync([Metadata, "ConsistencyHost.Rules.MassFormula"]);

        var (status, body) = await GetAsync(host, HealthSetup.ReadyPath);

        Assert.Equal(HttpStatusCode.OK, status);
        Assert.Equal("Healthy", body.GetProperty("status").GetString());
        Assert.Equal(["engine", "plugins", "workers"], Checks(body).Select(c => c.GetProperty("name").GetString()).Order(StringComparer.Ordinal));
        var plugins = Check(body, "plugins").GetProperty("data");
        Assert.Equal($"loaded from {Metadata}", plugins.GetProperty("spectrum-metadata").GetString());
        Assert.Equal("loaded from ConsistencyHost.Rules.MassFormula", plugins.GetProperty("mass-formula").GetString());
        Assert.Equal(ServingStatus.Serving, await GrpcStatusAsync(host, ""));
    }

    [Fact]
    public async Task Ready_RefusedPlugin_IsDegradedWithTheReasonAndStillServing()
    {
        await using var host = await RunningHost.StartAsync([Metadata], folderCreated: AddBrokenPlugin);

        var (status, body) = await GetAsync(host, HealthSetup.ReadyPath);

        // Degraded is still 200: the replica serves the other rules and says which one is missing.
        Assert.Equal(HttpStatusCode.OK, status);
        Assert.Equal("Degraded", body.GetProperty("status").GetString());
        var plugins = Check(body, "plugins");
        Assert.Equal("Degraded", plugins.GetProperty("status").GetString());
        Assert.StartsWith("refused (Broken):", plugins.GetProperty("data").GetProperty("Broken").GetString(), StringComparison.Ordinal);
        Assert.Equal(ServingStatus.Serving, await GrpcStatusAsync(host, "consistencyhost.v1.EntryCheck"));
    }

    [Fact]
    public async Task Ready_RequiredPluginRefused_Is503AndGrpcNotServing()
    {
        using var config = await HostileConfig.WriteAsync("""{ "Server": { "Health": { "RequiredPlugins": [ "Broken" ] } } }""");
        await using var host = await RunningHost.StartAsync([Metadata], config.Path, AddBrokenPlugin);

        var (status, body) = await GetAsync(host, HealthSetup.ReadyPath);

        Assert.Equal(HttpStatusCode.ServiceUnavailable, status);
        Assert.Equal("Unhealthy", Check(body, "plugins").GetProperty("status").GetString());
        Assert.Equal("not loaded", Check(body, "plugins").GetProperty("data").GetProperty("required:Broken").GetString());
        Assert.Equal(ServingStatus.NotServing, await GrpcStatusAsync(host, ""));
        Assert.Equal(ServingStatus.NotServing, await GrpcStatusAsync(host, "consistencyhost.v1.EntryCheck"));
    }

    [Fact]
    public async Task Ready_UnknownHealthKey_StopsStartUpNamingTheKey()
    {
        using var config = await HostileConfig.WriteAsync("""{ "Server": { "Health": { "WarmUp": true } } }""");

        var error = await Assert.ThrowsAsync<ConsistencyHost.Engine.Profiles.ProfileConfigurationException>(() => RunningHost.StartAsync([Metadata], config.Path));

        Assert.Contains("Server:Health:WarmUp: unknown key 'WarmUp'", error.Message, StringComparison.Ordinal);
    }

    internal static void AddBrokenPlugin(string pluginsPath)
    {
        var folder = Directory.CreateDirectory(Path.Combine(pluginsPath, "Broken")).FullName;
        File.WriteAllText(Path.Combine(folder, "Broken.dll"), "not a portable executable");
    }

    internal static async Task<(HttpStatusCode Status, JsonElement Body)> GetAsync(RunningHost host, string path)
    {
        using var http = new HttpClient { BaseAddress = host.HttpAddress, Timeout = TimeSpan.FromSeconds(60) };
        using var response = await http.GetAsync(path);
        Assert.Equal("application/json", response.Content.Headers.ContentType?.MediaType);
        using var document = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        return (response.StatusCode, document.RootElement.Clone());
    }

    internal static JsonElement Check(JsonElement body, string name) => Checks(body).Single(c => c.GetProperty("name").GetString() == name);

    private static IEnumerable<JsonElement> Checks(JsonElement body) => body.GetProperty("checks").EnumerateArray();

    private static async Task<ServingStatus> GrpcStatusAsync(RunningHost host, string service)
    {
        var reply = await new Health.HealthClient(host.Channel).CheckAsync(new HealthCheckRequest { Service = service }, deadline: DateTime.UtcNow.AddSeconds(60));
        return reply.Status;
    }
}
