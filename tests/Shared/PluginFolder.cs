namespace ConsistencyHost.Tests.Shared;

/// <summary>
/// A temporary plugin folder holding copies of chosen built plugins (built-in and fixtures), laid out as
/// the host expects: one sub-folder per plugin. Deleted on dispose.
/// </summary>
internal sealed class PluginFolder : IDisposable
{
    private PluginFolder(string path) => Path = path;

    public string Path { get; }

    /// <summary>Copies the named plugins (assembly names) from the build's drop folders.</summary>
    public static PluginFolder With(params string[] pluginNames)
    {
        var path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "ch-plugins-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(path);
        foreach (var name in pluginNames)
        {
            var source = new[] { RepoPaths.BuiltInPlugins, RepoPaths.FixturePlugins, RepoPaths.SamplePlugins }
                .Select(root => System.IO.Path.Combine(root, name))
                .FirstOrDefault(Directory.Exists) ?? throw new InvalidOperationException($"plugin {name} has not been built");
            CopyDirectory(source, System.IO.Path.Combine(path, name));
        }

        return new PluginFolder(path);
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
            // A loaded plugin may still be mapped; the temp folder is cleaned by the OS later.
        }
    }

    private static void CopyDirectory(string source, string target)
    {
        Directory.CreateDirectory(target);
        foreach (var file in Directory.EnumerateFiles(source, "*", SearchOption.AllDirectories))
        {
            var destination = System.IO.Path.Combine(target, System.IO.Path.GetRelativePath(source, file));
            Directory.CreateDirectory(System.IO.Path.GetDirectoryName(destination)!);
            File.Copy(file, destination, overwrite: true);
        }
    }
}
