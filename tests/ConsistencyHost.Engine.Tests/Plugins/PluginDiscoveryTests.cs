using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Tests.Vetting;
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

    [Fact]
    public void Discover_RefusedPluginBesideGoodOnes_IsListedAndTheOthersStillLoad()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        VettingCorpus.DropCompiled(folder.Path, "Vetting.ReadsClock", VettingCorpus.Emit(VettingCorpus.Compile("Vetting.ReadsClock")));
        VettingCorpus.DropSource(folder.Path, "Vetting.Good");

        var rules = PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache"));

        Assert.Equal(["Vetting.ReadsClock", "spectrum-metadata", "vetting-good"], rules.Select(r => r.Id).Order(StringComparer.Ordinal));
        Assert.Equal(["spectrum-metadata", "vetting-good"], rules.Where(r => r.IsLoaded).Select(r => r.Id).Order(StringComparer.Ordinal));
        Assert.StartsWith("refused by vetting of Vetting.ReadsClock.dll: CHSDK2001", rules.Single(r => !r.IsLoaded).LoadMessage);
    }

    [Fact]
    public void Discover_MalformedRuleId_IsRefusedWithTheAnalyzersWording()
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropCompiled(folder.Path, "Lab.BadId", VettingCorpus.EmitSource("Lab.BadId", """
            namespace Lab;
            [Rule("Bad_Id", "1.0", "Bad")]
            public sealed class BadIdRule : Rule<NoOptions>
            {
                protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken cancellationToken)
                {
                    cancellationToken.ThrowIfCancellationRequested();
                    yield break;
                }
            }
            """));

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, Path.Combine(folder.Path, ".cache")));

        Assert.Equal("CHSDK0002: rule class Lab.BadIdRule: rule id 'Bad_Id' must be lower-case words joined by hyphens, e.g. 'signal-count'; " +
                     "rule version '1.0' must be 'major.minor.patch', e.g. '1.0.0'", rule.LoadMessage);
    }
}
