using System.Text.RegularExpressions;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Docs;

/// <summary>The plugin-authoring guide's complete rule is real: the host compiles, vets and loads it as a source plugin.</summary>
public sealed partial class PluginAuthoringDocTests
{
    [GeneratedRegex("```csharp\n(?<code>.*?)```", RegexOptions.Singleline)]
    private static partial Regex CSharpBlock();

    [Fact]
    public void Guide_CompleteRuleSnippet_IsAcceptedAsASourcePlugin()
    {
        var guide = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "plugin-authoring.md")).Replace("\r\n", "\n");
        var rule = CSharpBlock().Matches(guide).Select(m => m.Groups["code"].Value).First(code => code.Contains("[Rule(", StringComparison.Ordinal));
        using var folder = PluginFolder.With();
        var plugin = Directory.CreateDirectory(Path.Combine(folder.Path, "Lab.Example")).FullName;
        File.WriteAllText(Path.Combine(plugin, "SolventStatedRule.cs"), rule);

        var loaded = Assert.Single(PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache")));

        Assert.True(loaded.IsLoaded, loaded.LoadMessage);
        Assert.Equal("lab-solvent-stated", loaded.Id);
    }

    [Fact]
    public void Guide_TestKitSnippet_IsRunVerbatimBySampleTests()
    {
        var guide = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "plugin-authoring.md")).Replace("\r\n", "\n");
        var snippet = CSharpBlock().Matches(guide).Select(m => m.Groups["code"].Value).Single(code => code.Contains("RuleHarness.Run", StringComparison.Ordinal));
        var tests = File.ReadAllText(Path.Combine(RepoPaths.Samples, "plugins", "Lindqvist.CouplingsListed.Tests", "CouplingsListedRuleTests.cs"));

        Assert.Contains(Normalise(snippet), Normalise(tests));
    }

    private static string Normalise(string code) => string.Join(" ", code.Split((char[])[' ', '\n', '\r'], StringSplitOptions.RemoveEmptyEntries));
}
