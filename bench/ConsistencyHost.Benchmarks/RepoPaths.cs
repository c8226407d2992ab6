namespace ConsistencyHost.Benchmarks;

/// <summary>Locates the repository (the folder holding ConsistencyHost.sln) and the inputs the benchmarks read.</summary>
public static class RepoPaths
{
    /// <summary>The repository root.</summary>
    public static string Root { get; } = FindRoot();

    /// <summary>The plugin folder the build drops (artifacts/plugins).</summary>
    public static string Plugins => Path.Combine(Root, "artifacts", "plugins");

    /// <summary>The first 5,000 NCI structures shipped by Debian's rdkit-data (4,999 lines).</summary>
    public const string NciFirst5K = "/usr/share/RDKit/Data/NCI/first_5K.smi";

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "ConsistencyHost.sln"))) return dir.FullName;
        }

        throw new InvalidOperationException($"no ConsistencyHost.sln above {AppContext.BaseDirectory}");
    }
}
