namespace ConsistencyHost.Isolation;

/// <summary>Finds the <c>dotnet</c> executable that runs the worker: the one running the host when it is a muxer.</summary>
internal static class DotnetMuxer
{
    public static string Path { get; } = Find();

    private static string Find()
    {
        var current = Environment.ProcessPath;
        if (current is not null && System.IO.Path.GetFileNameWithoutExtension(current) == "dotnet") return current;
        foreach (var candidate in Candidates())
        {
            if (File.Exists(candidate)) return candidate;
        }

        return "dotnet";
    }

    private static IEnumerable<string> Candidates()
    {
        if (Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } hostPath) yield return hostPath;
        if (Environment.GetEnvironmentVariable("DOTNET_ROOT") is { Length: > 0 } root) yield return System.IO.Path.Combine(root, "dotnet");
        foreach (var folder in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':', StringSplitOptions.RemoveEmptyEntries))
        {
            yield return System.IO.Path.Combine(folder, "dotnet");
        }

        // An apphost finds the runtime beside itself or in the usual install folders; so do we.
        yield return System.IO.Path.Combine(System.IO.Path.GetDirectoryName(typeof(object).Assembly.Location)!, "..", "..", "..", "dotnet");
        yield return "/usr/share/dotnet/dotnet";
        yield return "/usr/lib/dotnet/dotnet";
    }
}
