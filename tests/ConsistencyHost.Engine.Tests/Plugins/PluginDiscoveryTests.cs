using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Plugins;

public sealed class PluginDiscoveryTests
{
    [Fact]
    public void Discover_BuiltInPluginFolder_LoadsRuleWithItsMetadata()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");

        var rules = PluginDiscovery.Discover(folder.Path);

        var rule = Assert.Single(rules);
        Assert.True(rule.IsLoaded, rule.LoadMessage);
        Assert.Equal("spectrum-metadata", rule.Id);
        Assert.Equal("1.0.0", rule.Version);
        Assert.Equal("ConsistencyHost.Rules.SpectrumMetadata.dll", rule.Plugin);
    }

    [Fact]
    public void Discover_PluginFolder_SharesTheSdkWithTheHost()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path));

        // Same IRule type identity: the SDK was not loaded a second time into the plugin's context.
        Assert.IsAssignableFrom<ConsistencyHost.Sdk.Rules.IRule>(rule.Factory!());
        Assert.False(File.Exists(Path.Combine(folder.Path, "ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Sdk.dll")));
    }

    [Fact]
    public void Discover_FileThatIsNotAnAssembly_IsRefusedWithReason()
    {
        using var folder = PluginFolder.With();
        var bogus = Path.Combine(folder.Path, "Broken");
        Directory.CreateDirectory(bogus);
        File.WriteAllText(Path.Combine(bogus, "Broken.dll"), "not a portable executable");

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path));

        Assert.False(rule.IsLoaded);
        Assert.Equal("Broken.dll", rule.Plugin);
        Assert.NotEmpty(rule.LoadMessage);
    }

    [Fact]
    public void Discover_MissingFolder_FindsNothing() =>
        Assert.Empty(PluginDiscovery.Discover(Path.Combine(Path.GetTempPath(), "no-such-plugin-folder-" + Guid.NewGuid().ToString("N"))));
}
