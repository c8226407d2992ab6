using System.Net;
using System.Text.Json;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Deployment;

/// <summary>
/// The probe paths and ports written in deploy/k8s are the ones the host serves: the built host is started with
/// the ConfigMap's own configuration and the probes' paths are fetched from it; the ports agree with the
/// Dockerfile's ENTRYPOINT. (Here the host runs on loopback without TLS; in the cluster the same paths answer
/// over HTTPS once Server:Tls is configured.)
/// </summary>
public sealed class ProbeTests
{
    [Fact]
    public async Task Probes_ManifestPaths_AnswerOnTheBuiltHostWithTheConfigMapsConfiguration()
    {
        var manifests = await Manifests.LoadAsync();
        using var config = ConfigMapFile.Write(manifests);
        using var host = await HostProcess.StartAsync(RepoPaths.Root,
            ["dotnet", Path.Combine(CliProcess.Directory, "consistencyhost.dll"), "serve", "--port", "0", "--http-port", "0", "--config", config.Path]);

        foreach (var (probe, get) in Probes(manifests))
        {
            var (status, body) = await GetAsync(host.Http, get.GetProperty("path").GetString()!);
            Assert.True(status == HttpStatusCode.OK, $"{probe} {get.GetProperty("path")} answered {status}: {body}");
            Assert.Equal("Healthy", body.GetProperty("status").GetString());
        }
    }

    [Fact]
    public async Task Ports_ManifestsAndDockerfileEntrypoint_Agree()
    {
        var manifests = await Manifests.LoadAsync();
        var dockerfile = DockerfileSpec.Load();
        var http = int.Parse(dockerfile.EntrypointOption("--http-port"), System.Globalization.CultureInfo.InvariantCulture);
        var grpc = int.Parse(dockerfile.EntrypointOption("--port"), System.Globalization.CultureInfo.InvariantCulture);
        var container = Assert.Single(manifests.Single("Deployment").GetProperty("spec").GetProperty("template").GetProperty("spec").GetProperty("containers").EnumerateArray());
        var ports = container.GetProperty("ports").EnumerateArray().ToDictionary(p => p.GetProperty("name").GetString()!, p => p.GetProperty("containerPort").GetInt32());

        Assert.Equal((grpc, http), (ports["grpc"], ports["https"]));
        Assert.All(Probes(manifests), p => Assert.Equal(http, p.Get.GetProperty("port").GetInt32()));
        Assert.Equal(grpc, ServicePort(manifests, "consistencyhost-grpc", ports));
        Assert.Equal(http, ServicePort(manifests, "consistencyhost-http", ports));
    }

    internal static IEnumerable<(string Probe, JsonElement Get)> Probes(Manifests manifests)
    {
        var container = Assert.Single(manifests.Single("Deployment").GetProperty("spec").GetProperty("template").GetProperty("spec").GetProperty("containers").EnumerateArray());
        return new[] { "startupProbe", "readinessProbe", "livenessProbe" }
            .Where(name => container.TryGetProperty(name, out _))
            .Select(name => (name, container.GetProperty(name).GetProperty("httpGet")));
    }

    internal static async Task<(HttpStatusCode Status, JsonElement Body)> GetAsync(Uri http, string path)
    {
        using var client = new HttpClient { BaseAddress = http, Timeout = TimeSpan.FromSeconds(60) };
        using var response = await client.GetAsync(path);
        using var document = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        return (response.StatusCode, document.RootElement.Clone());
    }

    /// <summary>The container port a Service forwards to (its targetPort names a container port).</summary>
    private static int ServicePort(Manifests manifests, string service, Dictionary<string, int> containerPorts) =>
        containerPorts[Assert.Single(manifests.Single("Service", service).GetProperty("spec").GetProperty("ports").EnumerateArray()).GetProperty("targetPort").GetString()!];
}
