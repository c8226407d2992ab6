using System.Net;
using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;

namespace ConsistencyHost.Tests.Shared;

/// <summary>
/// A private certificate authority made at test time, with a server certificate for the given addresses and
/// client certificates, written as PEM files to a temporary folder (deleted on dispose), as an operator would
/// with openssl.
/// </summary>
public sealed class TestPki : IDisposable
{
    // Source: RFC 5280, section 4.2.1.12 (id-kp-serverAuth, id-kp-clientAuth).
    private const string ServerAuth = "1.3.6.1.5.5.7.3.1";
    private const string ClientAuth = "1.3.6.1.5.5.7.3.2";

    private TestPki(string folder, X509Certificate2 authority)
    {
        Folder = folder;
        Authority = authority;
    }

    public string Folder { get; }

    public X509Certificate2 Authority { get; }

    public string AuthorityPath => Path.Combine(Folder, "ca.pem");

    public string CertificatePath => Path.Combine(Folder, "server.pem");

    public string KeyPath => Path.Combine(Folder, "server.key");

    /// <summary>A CA, and a server certificate for localhost and <paramref name="addresses"/>, on disk.</summary>
    public static TestPki Create(params IPAddress[] addresses)
    {
        var folder = Directory.CreateTempSubdirectory("ch-pki-").FullName;
        var authority = CreateAuthority("ConsistencyHost test CA");
        var pki = new TestPki(folder, authority);
        File.WriteAllText(pki.AuthorityPath, authority.ExportCertificatePem());
        using var key = RSA.Create(2048);
        var request = new CertificateRequest("CN=consistencyhost", key, HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        var names = new SubjectAlternativeNameBuilder();
        names.AddDnsName("localhost");
        foreach (var address in addresses) names.AddIpAddress(address);
        request.CertificateExtensions.Add(names.Build());
        using var server = Issue(request, authority, ServerAuth);
        File.WriteAllText(pki.CertificatePath, server.ExportCertificatePem());
        File.WriteAllText(pki.KeyPath, key.ExportPkcs8PrivateKeyPem());
        return pki;
    }

    /// <summary>A client certificate issued by this CA (or, with <paramref name="issuer"/>, by another).</summary>
    public X509Certificate2 IssueClient(string name, X509Certificate2? issuer = null)
    {
        using var key = RSA.Create(2048);
        var request = new CertificateRequest($"CN={name}", key, HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        using var issued = Issue(request, issuer ?? Authority, ClientAuth);
        return issued.CopyWithPrivateKey(key);
    }

    public static X509Certificate2 CreateAuthority(string name)
    {
        using var key = RSA.Create(2048);
        var request = new CertificateRequest($"CN={name}", key, HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        request.CertificateExtensions.Add(new X509BasicConstraintsExtension(true, false, 0, true));
        request.CertificateExtensions.Add(new X509KeyUsageExtension(X509KeyUsageFlags.KeyCertSign | X509KeyUsageFlags.CrlSign, true));
        return request.CreateSelfSigned(DateTimeOffset.UtcNow.AddDays(-1), DateTimeOffset.UtcNow.AddDays(30));
    }

    public void Dispose() => Directory.Delete(Folder, recursive: true);

    private static X509Certificate2 Issue(CertificateRequest request, X509Certificate2 issuer, string usage)
    {
        request.CertificateExtensions.Add(new X509BasicConstraintsExtension(false, false, 0, true));
        request.CertificateExtensions.Add(new X509EnhancedKeyUsageExtension([new Oid(usage)], false));
        var serial = RandomNumberGenerator.GetBytes(16);
        serial[0] &= 0x7F;
        return request.Create(issuer, DateTimeOffset.UtcNow.AddDays(-1), DateTimeOffset.UtcNow.AddDays(7), serial);
    }
}
