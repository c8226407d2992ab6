using System.Net;
using System.Text;
using ConsistencyHost.Server.Access;
using ConsistencyHost.Tests.Shared;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Server.Tests.Access;

/// <summary>The "Server" snippet of docs/reliability.md's Access section is a configuration the host accepts beyond loopback.</summary>
public sealed class AccessDocTests
{
    [Fact]
    public void ReliabilityDoc_ServerSnippet_StartsBeyondLoopbackOnceItsFilesExist()
    {
        var doc = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "reliability.md"));
        var snippet = Assert.Single(DocBlocks.Json(doc), s => s.Contains("\"Server\"", StringComparison.Ordinal));
        using var pki = TestPki.Create();
        // The documented paths are a deployment's; the test's CA stands in for them.
        snippet = snippet.Replace("/etc/consistencyhost/tls/tls.crt", pki.CertificatePath, StringComparison.Ordinal)
            .Replace("/etc/consistencyhost/tls/tls.key", pki.KeyPath, StringComparison.Ordinal);
        using var stream = new MemoryStream(Encoding.UTF8.GetBytes(snippet));
        var server = new ConfigurationBuilder().AddJsonStream(stream).Build().GetSection("Server");

        var policy = AccessConfiguration.Read(server, IPAddress.Parse(server["BindAddress"]!));

        Assert.True(policy.UsesTls);
        Assert.Equal(1, policy.Keys.Count);
        Assert.Equal("eln-prod", policy.Keys.ClientOf(server["ApiKeys:eln-prod"]!));
    }
}
