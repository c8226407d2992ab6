using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Running;

public sealed class TrustTests
{
    [Fact]
    public void CheckEngine_DefaultTrust_BuiltInRuleTrustedFixtureNot()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.ThrowingRule");

        var engine = new CheckEngine(new EngineOptions { PluginsPath = folder.Path });

        Assert.True(Assert.Single(engine.Rules, r => r.Id == "spectrum-metadata").IsTrusted);
        Assert.False(Assert.Single(engine.Rules, r => r.Id == "fixture-throws").IsTrusted);
        // Without a worker executor (the embedded engine) every rule runs in-process, and says so.
        Assert.All(engine.Rules, r => Assert.Equal("in-process", engine.IsolationOf(r)));
    }
}
