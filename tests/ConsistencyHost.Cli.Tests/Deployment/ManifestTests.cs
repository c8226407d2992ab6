using System.Text.Json;

namespace ConsistencyHost.Cli.Tests.Deployment;

/// <summary>
/// deploy/k8s read by kubectl, and the settings an operator relies on. Field names and meanings:
/// Kubernetes API reference v1.32 (apps/v1 Deployment, v1 Service, autoscaling/v2 HorizontalPodAutoscaler).
/// </summary>
public sealed class ManifestTests
{
    [Fact]
    public async Task Manifests_EveryFile_ParsesAsKubernetesObjects()
    {
        var manifests = await Manifests.LoadAsync();

        var yamlFiles = Directory.EnumerateFiles(Manifests.Folder, "*.yaml").Count();
        Assert.Equal(yamlFiles, manifests.Objects.Count);
        Assert.Equal(
            ["ConfigMap", "Deployment", "HorizontalPodAutoscaler", "Service", "Service"],
            manifests.Objects.Select(o => o.GetProperty("kind").GetString()).Order(StringComparer.Ordinal));
    }

    [Fact]
    public async Task Deployment_ThreeReadOnlyReplicasWithOnlyTheWorkersCapabilitiesProbesAndLimits()
    {
        var spec = (await Manifests.LoadAsync()).Single("Deployment").GetProperty("spec");
        var pod = spec.GetProperty("template").GetProperty("spec");
        var container = Assert.Single(pod.GetProperty("containers").EnumerateArray());

        Assert.Equal(3, spec.GetProperty("replicas").GetInt32());
        // Root, so that each untrusted plugin's worker gets a uid of its own (a non-root host refuses them), with
        // every capability dropped but the five that needs (src/ConsistencyHost.Isolation/HostCredentials.cs).
        Assert.Equal(0, pod.GetProperty("securityContext").GetProperty("runAsUser").GetInt32());
        var security = container.GetProperty("securityContext");
        Assert.Equal(["ALL"], security.GetProperty("capabilities").GetProperty("drop").EnumerateArray().Select(c => c.GetString()));
        Assert.Equal(["CHOWN", "DAC_OVERRIDE", "KILL", "SETGID", "SETUID"],
            security.GetProperty("capabilities").GetProperty("add").EnumerateArray().Select(c => c.GetString()).Order(StringComparer.Ordinal));
        Assert.True(security.GetProperty("readOnlyRootFilesystem").GetBoolean());
        Assert.False(security.GetProperty("allowPrivilegeEscalation").GetBoolean());
        Assert.Equal("/tmp", MountOf(container, VolumeOf(pod, v => v.TryGetProperty("emptyDir", out _))));
        foreach (var kind in new[] { "requests", "limits" })
        {
            var resources = container.GetProperty("resources").GetProperty(kind);
            Assert.True(resources.TryGetProperty("cpu", out _) && resources.TryGetProperty("memory", out _), $"{kind} must set cpu and memory");
        }

        foreach (var (probe, path) in new[] { ("readinessProbe", "/health/ready"), ("livenessProbe", "/health/live") })
        {
            var get = container.GetProperty(probe).GetProperty("httpGet");
            Assert.Equal((path, 5152, "HTTPS"), (get.GetProperty("path").GetString(), get.GetProperty("port").GetInt32(), get.GetProperty("scheme").GetString()));
        }
    }

    [Fact]
    public async Task Deployment_TlsAndApiKeysComeFromSecretsUnderTheHostsConfigurationNames()
    {
        var pod = (await Manifests.LoadAsync()).Single("Deployment").GetProperty("spec").GetProperty("template").GetProperty("spec");
        var container = Assert.Single(pod.GetProperty("containers").EnumerateArray());
        var env = container.GetProperty("env").EnumerateArray().ToDictionary(e => e.GetProperty("name").GetString()!);

        Assert.Equal("0.0.0.0", env["Server__BindAddress"].GetProperty("value").GetString());
        var tlsFolder = MountOf(container, VolumeOf(pod, v => v.TryGetProperty("secret", out var s) && s.GetProperty("secretName").GetString() == "consistencyhost-tls"));
        Assert.Equal($"{tlsFolder}/tls.crt", env["Server__Tls__CertificatePath"].GetProperty("value").GetString());
        Assert.Equal($"{tlsFolder}/tls.key", env["Server__Tls__KeyPath"].GetProperty("value").GetString());
        var keys = env.Where(e => e.Key.StartsWith("Server__ApiKeys__", StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(keys);
        Assert.All(keys, key => Assert.Equal("consistencyhost-api-keys", key.Value.GetProperty("valueFrom").GetProperty("secretKeyRef").GetProperty("name").GetString()));
    }

    [Fact]
    public async Task Services_HeadlessGrpcAndClusterIpJsonSelectTheDeploymentsPods()
    {
        var manifests = await Manifests.LoadAsync();
        var podLabels = manifests.Single("Deployment").GetProperty("spec").GetProperty("template").GetProperty("metadata").GetProperty("labels");
        var grpc = manifests.Single("Service", "consistencyhost-grpc").GetProperty("spec");
        var http = manifests.Single("Service", "consistencyhost-http").GetProperty("spec");

        Assert.Equal("None", grpc.GetProperty("clusterIP").GetString());
        Assert.Equal(5151, Assert.Single(grpc.GetProperty("ports").EnumerateArray()).GetProperty("port").GetInt32());
        Assert.False(http.TryGetProperty("clusterIP", out var ip) && ip.GetString() == "None");
        Assert.Equal(5152, Assert.Single(http.GetProperty("ports").EnumerateArray()).GetProperty("port").GetInt32());
        foreach (var service in new[] { grpc, http })
        {
            Assert.All(service.GetProperty("selector").EnumerateObject(), label => Assert.Equal(label.Value.GetString(), podLabels.GetProperty(label.Name).GetString()));
        }
    }

    [Fact]
    public async Task HorizontalPodAutoscaler_ScalesTheDeploymentOnCpuFromThreeReplicas()
    {
        var manifests = await Manifests.LoadAsync();
        var spec = manifests.Single("HorizontalPodAutoscaler").GetProperty("spec");

        Assert.Equal(("Deployment", "consistencyhost"), (spec.GetProperty("scaleTargetRef").GetProperty("kind").GetString(), spec.GetProperty("scaleTargetRef").GetProperty("name").GetString()));
        Assert.Equal(manifests.Single("Deployment").GetProperty("spec").GetProperty("replicas").GetInt32(), spec.GetProperty("minReplicas").GetInt32());
        Assert.Equal("cpu", Assert.Single(spec.GetProperty("metrics").EnumerateArray()).GetProperty("resource").GetProperty("name").GetString());
    }

    private static string VolumeOf(JsonElement pod, Func<JsonElement, bool> predicate) =>
        Assert.Single(pod.GetProperty("volumes").EnumerateArray(), v => predicate(v)).GetProperty("name").GetString()!;

    private static string MountOf(JsonElement container, string volume) =>
        Assert.Single(container.GetProperty("volumeMounts").EnumerateArray(), m => m.GetProperty("name").GetString() == volume).GetProperty("mountPath").GetString()!;
}
