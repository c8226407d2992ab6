using System.Net;
using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;
using ConsistencyHost.Engine.Profiles;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Server.Access;

/// <summary>
/// Reads <c>Server:Tls</c> and <c>Server:ApiKeys</c> and refuses, listing every problem, a configuration that
/// would serve beyond loopback without TLS or without authentication, a key shorter than
/// <see cref="AccessMessages.MinimumKeyLength"/> characters, or a PEM file that cannot be read.
/// </summary>
/// <remarks>
/// Keys are required wherever they are configured, loopback included: configuring them says the operator wants
/// them. With nothing configured on loopback the host stays anonymous, as it was.
/// </remarks>
public static class AccessConfiguration
{
    private const string CertificateKey = "Server:Tls:CertificatePath";
    private const string PrivateKeyKey = "Server:Tls:KeyPath";
    private const string AuthorityKey = "Server:Tls:ClientCertificateAuthorityPath";

    /// <summary>Reads the policy from the <c>Server</c> section for a host bound to <paramref name="address"/>.</summary>
    /// <exception cref="ProfileConfigurationException">Every problem found.</exception>
    public static AccessPolicy Read(IConfigurationSection server, IPAddress address)
    {
        var problems = new List<string>();
        var tls = server.GetSection("Tls");
        var (certificate, chain) = ReadServerCertificate(tls["CertificatePath"], tls["KeyPath"], problems);
        var authorities = ReadAuthorities(tls["ClientCertificateAuthorityPath"], problems);
        var keys = ApiKeys.Read(server.GetSection("ApiKeys"), problems);
        if (tls["ClientCertificateAuthorityPath"] is not null && tls["CertificatePath"] is null) problems.Add(AccessMessages.AuthorityWithoutTls);
        if (!IPAddress.IsLoopback(address))
        {
            // Judged on what is set, so that a set but faulty value gets its own problem rather than a second one here.
            if (tls["CertificatePath"] is null) problems.Add(AccessMessages.NeedsTls(address.ToString()));
            var authenticates = server.GetSection("ApiKeys").GetChildren().Any() || tls["ClientCertificateAuthorityPath"] is not null;
            if (!authenticates) problems.Add(AccessMessages.NeedsAuthentication(address.ToString()));
        }

        if (problems.Count > 0) throw new ProfileConfigurationException(problems, ProfileConfigurationException.HostTitle);
        return new AccessPolicy { ServerCertificate = certificate, ServerChain = chain, ClientAuthorities = authorities, Keys = keys };
    }

    private static (X509Certificate2?, X509Certificate2Collection) ReadServerCertificate(string? certificatePath, string? keyPath, List<string> problems)
    {
        if (certificatePath is null && keyPath is null) return (null, []);
        if (certificatePath is null) problems.Add(AccessMessages.NotSet(CertificateKey, $"{PrivateKeyKey} is set and needs its certificate"));
        if (keyPath is null) problems.Add(AccessMessages.NotSet(PrivateKeyKey, $"{CertificateKey} is set and needs its private key's PEM file"));
        if (certificatePath is null || keyPath is null || !Exists(CertificateKey, certificatePath, problems) | !Exists(PrivateKeyKey, keyPath, problems))
        {
            return (null, []);
        }

        try
        {
            var certificate = X509Certificate2.CreateFromPemFile(certificatePath, keyPath);
            var all = new X509Certificate2Collection();
            all.ImportFromPemFile(certificatePath);
            return (certificate, [.. all.Skip(1)]);
        }
        catch (CryptographicException error)
        {
            problems.Add(AccessMessages.Unreadable($"{CertificateKey} with {PrivateKeyKey}", certificatePath, error.Message));
            return (null, []);
        }
    }

    private static X509Certificate2Collection ReadAuthorities(string? path, List<string> problems)
    {
        if (path is null || !Exists(AuthorityKey, path, problems)) return [];
        try
        {
            var authorities = new X509Certificate2Collection();
            authorities.ImportFromPemFile(path);
            if (authorities.Count == 0) problems.Add(AccessMessages.Unreadable(AuthorityKey, path, "no CERTIFICATE block"));
            return authorities;
        }
        catch (CryptographicException error)
        {
            problems.Add(AccessMessages.Unreadable(AuthorityKey, path, error.Message));
            return [];
        }
    }

    private static bool Exists(string key, string path, List<string> problems)
    {
        if (File.Exists(path)) return true;
        problems.Add(AccessMessages.FileMissing(key, path));
        return false;
    }
}
