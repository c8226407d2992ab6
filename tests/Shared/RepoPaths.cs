namespace ConsistencyHost.Tests.Shared;

/// <summary>Locates the repository and the plugin folders the build drops, from a test's output folder.</summary>
internal static class RepoPaths
{
    public static string Root { get; } = FindRoot();

    /// <summary>The built-in plugins, one sub-folder each.</summary>
    public static string BuiltInPlugins => Path.Combine(Root, "artifacts", "plugins");

    /// <summary>The hostile and broken fixture plugins.</summary>
    public static string FixturePlugins => Path.Combine(Root, "artifacts", "test-plugins");

    /// <summary>The sample lab's plugins (samples/plugins), built like any lab's plugin.</summary>
    public static string SamplePlugins => Path.Combine(Root, "artifacts", "sample-plugins");

    public static string Samples => Path.Combine(Root, "samples");

    /// <summary>The CLI's output folder (consistencyhost.dll and its plugins/), built in the tests' configuration.</summary>
    public static string Cli => Path.Combine(Root, "src", "ConsistencyHost.Cli", "bin", Configuration, "net10.0");

    /// <summary>The build configuration the tests run in (Debug or Release), read from their output folder.</summary>
    public static string Configuration { get; } =
        new DirectoryInfo(AppContext.BaseDirectory.TrimEnd(Path.DirectorySeparatorChar)).Parent!.Name;

    private static string FindRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "ConsistencyHost.sln")))
        {
            directory = directory.Parent;
        }

        return directory?.FullName ?? throw new InvalidOperationException("ConsistencyHost.sln not found above " + AppContext.BaseDirectory);
    }
}
