namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>A temporary JSON configuration file for the host, deleted on dispose.</summary>
internal sealed class HostileConfig : IDisposable
{
    private HostileConfig(string path) => Path = path;

    public string Path { get; }

    public static async Task<HostileConfig> WriteAsync(string json)
    {
        var path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), $"ch-config-{Guid.NewGuid():N}.json");
        await File.WriteAllTextAsync(path, json);
        return new HostileConfig(path);
    }

    public void Dispose() => File.Delete(Path);
}
