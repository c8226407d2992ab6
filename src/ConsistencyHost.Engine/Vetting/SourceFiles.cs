namespace ConsistencyHost.Engine.Vetting;

/// <summary>One source file of a source plugin, with its path relative to the plugin folder ('/' separated).</summary>
public sealed record SourceFile(string RelativePath, string Text);

/// <summary>Reads a source plugin's files in a stable order, skipping build output folders.</summary>
public static class SourceFiles
{
    private static readonly string[] Skipped = ["bin", "obj"];

    /// <summary>True when <paramref name="folder"/> holds at least one <c>.cs</c> file (outside bin/ and obj/).</summary>
    public static bool IsSourcePlugin(string folder) => Paths(folder).Any();

    /// <summary>Every <c>.cs</c> file, ordered by relative path (ordinal) so that the hash and the build are stable.</summary>
    public static IReadOnlyList<SourceFile> Read(string folder) =>
        [.. Paths(folder)
            .Select(path => new SourceFile(Path.GetRelativePath(folder, path).Replace('\\', '/'), File.ReadAllText(path)))
            .OrderBy(file => file.RelativePath, StringComparer.Ordinal)];

    private static IEnumerable<string> Paths(string folder) =>
        Directory.EnumerateFiles(folder, "*.cs", SearchOption.AllDirectories)
            .Where(path => !Path.GetRelativePath(folder, path).Split(Path.DirectorySeparatorChar).Any(part => Skipped.Contains(part)));
}
