using System.Text.Json;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Vetting;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Docs;

/// <summary>The <c>dotnet new</c> template's rule passes the host's vetting and carries the id the template replaces.</summary>
public sealed class RulePluginTemplateTests
{
    private static readonly string Template = Path.Combine(RepoPaths.Root, "templates", "rule-plugin");

    [Fact]
    public void Template_RuleSources_AreAcceptedAsASourcePlugin()
    {
        using var folder = PluginFolder.With();
        var plugin = Directory.CreateDirectory(Path.Combine(folder.Path, "Lab.RulePlugin")).FullName;
        foreach (var file in SourceFiles.Read(Path.Combine(Template, "Lab.RulePlugin")))
        {
            File.WriteAllText(Path.Combine(plugin, file.RelativePath), file.Text);
        }

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache")));

        Assert.True(rule.IsLoaded, rule.LoadMessage);
        Assert.Equal(TemplateDefault("RuleId"), rule.Id);
        Assert.Equal(TemplateDefault("RuleTitle"), rule.Title);
    }

    private static string TemplateDefault(string symbol)
    {
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(Template, ".template.config", "template.json")));
        var definition = json.RootElement.GetProperty("symbols").GetProperty(symbol);
        Assert.Equal(definition.GetProperty("defaultValue").GetString(), definition.GetProperty("replaces").GetString());
        return definition.GetProperty("replaces").GetString()!;
    }
}
