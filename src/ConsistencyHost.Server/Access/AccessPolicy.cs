using System.Security.Cryptography.X509Certificates;

namespace ConsistencyHost.Server.Access;

/// <summary>
/// Who may call the host, read and checked once at start (<see cref="AccessConfiguration"/>): the server's TLS
/// certificate, the authority client certificates must chain to (mTLS), and the API keys.
/// </summary>
public sealed class AccessPolicy
{
    /// <summary>Loopback without TLS or authentication: anonymous calls, as before access control existed.</summary>
    public static AccessPolicy Anonymous { get; } = new();

    /// <summary>The server's certificate with its private key; null serves cleartext (loopback only).</summary>
    public X509Certificate2? ServerCertificate { get; init; }

    /// <summary>Intermediate certificates sent after the server's own (the rest of the certificate PEM file).</summary>
    public X509Certificate2Collection ServerChain { get; init; } = [];

    /// <summary>Roots a client certificate must chain to; empty when mTLS is off.</summary>
    public X509Certificate2Collection ClientAuthorities { get; init; } = [];

    /// <summary>The API keys; empty when keys are off.</summary>
    public ApiKeyStore Keys { get; init; } = ApiKeyStore.Empty;

    /// <summary>True when the host serves TLS.</summary>
    public bool UsesTls => ServerCertificate is not null;

    /// <summary>True when clients must present a certificate from <see cref="ClientAuthorities"/>.</summary>
    public bool RequiresClientCertificate => ClientAuthorities.Count > 0;

    /// <summary>True when any call other than health must authenticate.</summary>
    public bool RequiresAuthentication => RequiresClientCertificate || Keys.Count > 0;
}
