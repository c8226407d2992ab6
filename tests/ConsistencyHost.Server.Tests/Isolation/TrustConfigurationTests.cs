using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Profiles;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Server.Tests.Isolation;

public sealed class TrustConfigurationTests
{
    [Fact]
    public void Read_TrustedPluginsListed_ReplacesBuiltInDefault()
    {
        var section = new ConfigurationBuilder().AddInMemoryCollection(new Dictionary<string, string?>
        {
            ["ConsistencyHost:TrustedPlugins:0"] = "Lab.Rules",
        }).Build().GetSection("ConsistencyHost");

        var options = EngineConfiguration.Read(section, "plugins");

        Assert.Equal(["Lab.Rules"], options.TrustedPlugins);
    }

    [Fact]
    public void Read_NoTrustedPlugins_KeepsBuiltInRules()
    {
        var section = new ConfigurationBuilder().Build().GetSection("ConsistencyHost");

        var options = EngineConfiguration.Read(section, "plugins");

        Assert.Contains("ConsistencyHost.Rules.SpectrumMetadata", options.TrustedPlugins);
        Assert.Equal(EngineOptions.BuiltInPlugins.Count, options.TrustedPlugins.Count);
    }
}
