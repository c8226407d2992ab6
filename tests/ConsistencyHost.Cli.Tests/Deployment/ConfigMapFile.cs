namespace ConsistencyHost.Cli.Tests.Deployment;

/// <summary>The ConfigMap's consistencyhost.json written to a temporary file, as the pod sees it mounted; deleted on dispose.</summary>
internal sealed class ConfigMapFile : IDisposable
{
    private ConfigMapFile(string path) => Path = path;

    public string Path { get; }

    public static ConfigMapFile Write(Manifests manifests)
    {
        var json = manifests.Single("ConfigMap", "consistencyhost-config").GetProperty("data").GetProperty("consistencyhost.json").GetString()!;
        var path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), $"ch-configmap-{Guid.NewGuid():N}.json");
        File.WriteAllText(path, json);
        return new ConfigMapFile(path);
    }

    public void Dispose() => File.Delete(Path);
}
