using System.Text.Json;
using System.Text.RegularExpressions;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Deployment;

/// <summary>
/// What the tests need from deploy/Dockerfile, read from the file itself so that they run what the image runs:
/// the <c>dotnet publish</c> command of the build stage, the ARG defaults and the exec-form ENTRYPOINT.
/// </summary>
internal sealed partial record DockerfileSpec(IReadOnlyList<string> PublishCommand, string PublishOutput, IReadOnlyDictionary<string, string> Args, IReadOnlyList<string> Entrypoint, string Text)
{
    public static string PathName => Path.Combine(RepoPaths.Root, "deploy", "Dockerfile");

    public static DockerfileSpec Load()
    {
        var text = File.ReadAllText(PathName);
        var instructions = Instructions(text);
        var args = instructions.Where(i => i.StartsWith("ARG ", StringComparison.Ordinal) && i.Contains('=', StringComparison.Ordinal))
            .Select(i => i[4..].Split('=', 2)).ToDictionary(p => p[0].Trim(), p => p[1].Trim(), StringComparer.Ordinal);
        var publish = Assert.Single(instructions, i => i.StartsWith("RUN dotnet publish ", StringComparison.Ordinal))[4..]
            .Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var output = publish.SkipWhile(word => word is not ("-o" or "--output")).Skip(1).First();
        var entrypoint = JsonSerializer.Deserialize<string[]>(Assert.Single(instructions, i => i.StartsWith("ENTRYPOINT ", StringComparison.Ordinal))[11..])!;
        return new DockerfileSpec(publish, output, args, entrypoint, text);
    }

    /// <summary>The value of an option in the ENTRYPOINT (e.g. "--http-port").</summary>
    public string EntrypointOption(string name) => Entrypoint.SkipWhile(a => a != name).Skip(1).First();

    /// <summary>The publish command with ${ARG} references replaced and the output folder moved.</summary>
    public IReadOnlyList<string> PublishCommandFor(IReadOnlyDictionary<string, string> argValues, string outputFolder) =>
        [.. PublishCommand.Select(word => word == PublishOutput ? outputFolder : ArgReference().Replace(word, m => argValues[m.Groups[1].Value]))];

    /// <summary>Instructions with continuation lines joined and comments dropped.</summary>
    private static List<string> Instructions(string text)
    {
        var joined = Regex.Replace(text, @"\\\r?\n", " ");
        return [.. joined.Split('\n').Select(l => Regex.Replace(l.Trim(), @"\s+", " ")).Where(l => l.Length > 0 && !l.StartsWith('#'))];
    }

    [GeneratedRegex(@"\$\{(\w+)\}")]
    private static partial Regex ArgReference();
}
