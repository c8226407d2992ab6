using System.Text;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Server.Hosting;
using ConsistencyHost.Tests.Shared;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>Every configuration snippet in docs/reliability.md is read by the host's own configuration readers.</summary>
public sealed class ReliabilityDocTests
{
    [Fact]
    public void ReliabilityDoc_JsonSnippets_AreValidHostConfiguration()
    {
        var doc = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "reliability.md"));
        // The "Server" snippet of the Access section is AccessDocTests' to check.
        var snippets = DocBlocks.Json(doc).Where(s => s.Contains("\"ConsistencyHost\"", StringComparison.Ordinal)).ToList();

        Assert.Equal(2, snippets.Count);
        foreach (var snippet in snippets)
        {
            using var stream = new MemoryStream(Encoding.UTF8.GetBytes(snippet));
            var section = new ConfigurationBuilder().AddJsonStream(stream).Build().GetSection("ConsistencyHost");
            var options = EngineConfiguration.Read(section, "plugins");
            Assert.Empty(options.ConfigurationProblems);
            using var executor = IsolationConfiguration.CreateExecutor(section.GetSection("Isolation"));

            Assert.NotEmpty(options.TrustedPlugins);
        }
    }
}
