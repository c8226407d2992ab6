using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;

namespace ConsistencyHost.Server.Access;

/// <summary>
/// Checks a client certificate against the configured authorities only (not the machine's trust store): it must
/// chain to one of them, be within its validity period and allow client authentication.
/// </summary>
/// <remarks>
/// Revocation is not checked (no CRL or OCSP): a private CA for a handful of notebook servers rarely publishes
/// either; short-lived client certificates are the remedy, and docs/reliability.md says so.
/// </remarks>
internal static class ClientCertificates
{
    // Source: RFC 5280, section 4.2.1.12, id-kp-clientAuth.
    private const string ClientAuthentication = "1.3.6.1.5.5.7.3.2";

    public static bool IsTrusted(X509Certificate2 certificate, X509Certificate2Collection authorities)
    {
        using var chain = new X509Chain();
        chain.ChainPolicy.TrustMode = X509ChainTrustMode.CustomRootTrust;
        chain.ChainPolicy.CustomTrustStore.AddRange(authorities);
        chain.ChainPolicy.RevocationMode = X509RevocationMode.NoCheck;
        chain.ChainPolicy.ApplicationPolicy.Add(new Oid(ClientAuthentication));
        return chain.Build(certificate);
    }

    /// <summary>The name logged for a certificate-authenticated client: its subject's common name.</summary>
    public static string ClientName(X509Certificate2 certificate) => certificate.GetNameInfo(X509NameType.SimpleName, forIssuer: false);
}
