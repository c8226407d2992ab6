namespace ConsistencyHost.Tests.Shared;

/// <summary>
/// A temporary plugin folder holding copies of chosen built plugins (built-in and fixtures), laid out as
/// the host expects: one sub-folder per plugin. Deleted on dispose. Modes are set explicitly (folders 0755,
/// files 0644) rather than left to the umask: the host refuses a plugin folder its group or others may write,
/// and the machine running the tests has a umask nobody here chose.
/// </summary>
internal sealed class PluginFolder : IDisposable
{
    private PluginFolder(string path) => Path = path;

    public string Path { get; }

    /// <summary>Copies the named plugins (assembly names) from the build's drop folders.</summary>
    public static PluginFolder With(params string[] pluginNames)
    {
        var path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "ch-plugins-" + Guid.NewGuid().ToString("N"));
        CreateFolder(path);
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

    /// <summary>Copies a source plugin's folder (tests/fixtures/…/Name) into a plugin folder as Name/, with the modes the host accepts.</summary>
    public static void CopySourcePlugin(string pluginsPath, string sourceFolder) =>
        CopyDirectory(sourceFolder, System.IO.Path.Combine(pluginsPath, System.IO.Path.GetFileName(sourceFolder)));

    /// <summary>Creates a folder (and any missing parents) with mode 0755; returns its path.</summary>
    public static string CreateFolder(string path)
    {
        if (OperatingSystem.IsWindows()) return Directory.CreateDirectory(path).FullName;
        var created = Directory.CreateDirectory(path, FolderMode);
        // CreateDirectory's mode still passes through the umask; chmod does not.
        File.SetUnixFileMode(created.FullName, FolderMode);
        return created.FullName;
    }

    /// <summary>Writes a file with mode 0644, creating its folder as <see cref="CreateFolder"/> does.</summary>
    public static void WriteFile(string path, string text)
    {
        CreateFolder(System.IO.Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text);
        if (!OperatingSystem.IsWindows()) File.SetUnixFileMode(path, FileMode);
    }

    private const UnixFileMode FolderMode = UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute |
        UnixFileMode.GroupRead | UnixFileMode.GroupExecute | UnixFileMode.OtherRead | UnixFileMode.OtherExecute;

    private const UnixFileMode FileMode = UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead | UnixFileMode.OtherRead;

    private static void CopyDirectory(string source, string target)
    {
        CreateFolder(target);
        foreach (var file in Directory.EnumerateFiles(source, "*", SearchOption.AllDirectories))
        {
            var destination = System.IO.Path.Combine(target, System.IO.Path.GetRelativePath(source, file));
            CreateFolder(System.IO.Path.GetDirectoryName(destination)!);
            File.Copy(file, destination, overwrite: true);
            if (!OperatingSystem.IsWindows()) File.SetUnixFileMode(destination, FileMode);
        }
    }
}
