using System.Net;
using System.Security.Cryptography;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>
/// <c>serve</c> with TLS flags and a key from the environment, called by <c>batch --server https://…</c> with the
/// key from a file or from CONSISTENCYHOST_API_KEY and the test CA from --ca-cert, all as real processes.
/// </summary>
public sealed class SecuredServeTests(SecuredServeTests.Host host) : IClassFixture<SecuredServeTests.Host>, IDisposable
{
    private readonly string _out = Directory.CreateTempSubdirectory("ch-batch-tls-").FullName;

    public void Dispose() => Directory.Delete(_out, recursive: true);

    [Fact]
    public async Task Batch_KeyFileAndCaCert_ChecksEveryEntryOverTls()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("batch", Path.Combine(RepoPaths.Samples, "entries"), "--out", _out,
            "--server", host.Address.ToString(), "--ca-cert", host.Pki.AuthorityPath, "--api-key-file", host.KeyFile);

        Assert.True(exit == 0, stderr);
        Assert.Equal("https", host.Address.Scheme);
        Assert.Contains("3 entries, 0 with an error", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Batch_KeyFromEnvironment_ChecksEveryEntry()
    {
        var environment = new Dictionary<string, string> { ["CONSISTENCYHOST_API_KEY"] = host.Key };

        var (exit, stdout, stderr) = await CliProcess.RunWithEnvironmentAsync(environment, "batch", Path.Combine(RepoPaths.Samples, "entries"),
            "--out", _out, "--server", host.Address.ToString(), "--ca-cert", host.Pki.AuthorityPath);

        Assert.True(exit == 0, stderr);
        Assert.Contains("3 entries", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Batch_NoKey_ExitsTwoSayingHowToGiveIt()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("batch", Path.Combine(RepoPaths.Samples, "entries"), "--out", _out,
            "--server", host.Address.ToString(), "--ca-cert", host.Pki.AuthorityPath);

        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Contains("missing key", stderr, StringComparison.Ordinal);
        Assert.Contains("--api-key-file", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Batch_WithoutCaCert_DoesNotTrustThePrivateCaAndSaysSo()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("batch", Path.Combine(RepoPaths.Samples, "entries"), "--out", _out,
            "--server", host.Address.ToString(), "--api-key-file", host.KeyFile);

        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Contains("--ca-cert", stderr, StringComparison.Ordinal);
        Assert.False(File.Exists(Path.Combine(_out, "reports.jsonl")) && File.ReadLines(Path.Combine(_out, "reports.jsonl")).Any());
    }

    [Fact]
    public async Task Serve_NonLoopbackWithoutTls_ExitsTwoNamingTheSettings()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("serve", "--bind", "0.0.0.0", "--port", "0", "--http-port", "0");

        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Contains("Server:Tls:CertificatePath", stderr, StringComparison.Ordinal);
        Assert.Contains("Server:ApiKeys:<client-name>", stderr, StringComparison.Ordinal);
    }

    /// <summary>One TLS host for the class: certificate flags, the key in Server__ApiKeys__eln-cli.</summary>
    public sealed class Host : IAsyncLifetime
    {
        private ServeProcess? _serve;

        public TestPki Pki { get; } = TestPki.Create(IPAddress.Loopback);

        public string Key { get; } = Convert.ToBase64String(RandomNumberGenerator.GetBytes(32));

        public string KeyFile => Path.Combine(Pki.Folder, "client.key");

        public Uri Address => _serve!.Grpc;

        public async Task InitializeAsync()
        {
            // Written as `echo KEY > file` would: the trailing newline is not part of the key.
            await File.WriteAllTextAsync(KeyFile, Key + "\n");
            _serve = await ServeProcess.StartAsync(
                ["--bind", "127.0.0.1", "--tls-cert", Pki.CertificatePath, "--tls-key", Pki.KeyPath],
                new Dictionary<string, string> { ["Server__ApiKeys__eln-cli"] = Key });
        }

        public Task DisposeAsync()
        {
            _serve?.Dispose();
            Pki.Dispose();
            return Task.CompletedTask;
        }
    }
}
