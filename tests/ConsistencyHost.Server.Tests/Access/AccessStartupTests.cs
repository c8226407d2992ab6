using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Server.Access;
using ConsistencyHost.Server.Hosting;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Tests.Shared;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.Access;

/// <summary>Start-up refuses access configuration that would expose the host, naming the keys to set.</summary>
public sealed class AccessStartupTests
{
    private static readonly string GoodKey = new('k', AccessMessages.MinimumKeyLength);

    [Fact]
    public void Build_NonLoopbackWithoutTls_FailsNamingTheTlsKeys()
    {
        var error = Refused(new { BindAddress = "0.0.0.0", ApiKeys = new Dictionary<string, string> { ["eln-prod"] = GoodKey } });

        Assert.Equal(AccessMessages.NeedsTls("0.0.0.0"), Assert.Single(error.Problems));
        Assert.Contains("Server:Tls:CertificatePath", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Build_NonLoopbackWithTlsButNoKeysOrCa_FailsNamingApiKeysAndTheCa()
    {
        using var pki = TestPki.Create();

        var error = Refused(new { BindAddress = "0.0.0.0", Tls = new { pki.CertificatePath, pki.KeyPath } });

        var problem = Assert.Single(error.Problems);
        Assert.Equal(AccessMessages.NeedsAuthentication("0.0.0.0"), problem);
        Assert.Contains("Server:ApiKeys:<client-name>", problem, StringComparison.Ordinal);
        Assert.Contains("Server:Tls:ClientCertificateAuthorityPath", problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Build_ShortKeyAndMissingKeyFile_ListsBothWithoutTheKey()
    {
        const string Short = "abc123-too-short";
        using var pki = TestPki.Create();
        var missing = Path.Combine(pki.Folder, "absent.key");

        var error = Refused(new { Tls = new { pki.CertificatePath, KeyPath = missing }, ApiKeys = new Dictionary<string, string> { ["eln-short"] = Short } });

        Assert.Equal([AccessMessages.FileMissing("Server:Tls:KeyPath", missing), AccessMessages.KeyTooShort("eln-short")], error.Problems);
        Assert.DoesNotContain(Short, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Build_ApiKeysAsAnArray_FailsAskingForAMap()
    {
        var error = Refused(new { ApiKeys = new[] { GoodKey } });

        Assert.Equal(AccessMessages.KeysNotAMap("0"), Assert.Single(error.Problems));
        Assert.DoesNotContain(GoodKey, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Build_CertificateWithoutItsKey_FailsNamingKeyPath()
    {
        using var pki = TestPki.Create();

        var error = Refused(new { Tls = new { pki.CertificatePath } });

        Assert.StartsWith("Server:Tls:KeyPath: not set", Assert.Single(error.Problems), StringComparison.Ordinal);
    }

    [Fact]
    public async Task CheckEntry_KeysOnLoopbackWithoutTls_AreRequiredToo()
    {
        await using var host = await SecuredHost.StartAsync(new { ApiKeys = new Dictionary<string, string> { ["eln-local"] = GoodKey } }, authority: null);
        using var channel = host.Channel();
        var client = new ConsistencyHost.Contract.V1.EntryCheck.EntryCheckClient(channel);

        var refused = await Assert.ThrowsAsync<RpcException>(() => client.CheckEntryAsync(Requests.Complete("AIS-LQ-S001"), deadline: DateTime.UtcNow.AddSeconds(60)).ResponseAsync);
        var report = await client.CheckEntryAsync(Requests.Complete("AIS-LQ-S002"), SecuredHost.WithKey(GoodKey), DateTime.UtcNow.AddSeconds(60));

        Assert.Equal(("http", "127.0.0.1"), (host.Grpc.Scheme, host.Grpc.Host));
        Assert.Equal(StatusCode.Unauthenticated, refused.StatusCode);
        Assert.Equal("AIS-LQ-S002", report.EntryId);
    }

    private static ProfileConfigurationException Refused(object server)
    {
        var config = SecuredHost.WriteConfig(server);
        using var plugins = PluginFolder.With();
        try
        {
            return Assert.Throws<ProfileConfigurationException>(() =>
                ServerApp.Build(new ServerLaunch { PluginsPath = plugins.Path, Port = 0, HttpPort = 0, ConfigFile = config }));
        }
        finally
        {
            File.Delete(config);
        }
    }
}
