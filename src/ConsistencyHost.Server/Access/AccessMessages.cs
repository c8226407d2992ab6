namespace ConsistencyHost.Server.Access;

/// <summary>
/// Every start-up problem and refusal reason of the access checks, in one place; tests refer to them. No
/// message ever carries a key or any part of one.
/// </summary>
public static class AccessMessages
{
    /// <summary>The header (gRPC metadata key) that carries the API key.</summary>
    public const string KeyHeader = "x-api-key";

    /// <summary>The shortest key accepted, in characters: 32 random characters from base64 carry 192 bits.</summary>
    public const int MinimumKeyLength = 32;

    /// <summary>Refusal reason: no x-api-key header.</summary>
    public const string MissingKey = "missing key";

    /// <summary>Refusal reason: the x-api-key header holds no configured key.</summary>
    public const string UnknownKey = "unknown key";

    /// <summary>Refusal reason: mTLS is on and the connection carries no client certificate.</summary>
    public const string NoClientCertificate = "no client certificate";

    /// <summary>Refusal reason: the client certificate does not chain to the configured authority.</summary>
    public const string UntrustedClientCertificate = "untrusted client certificate";

    public static string NeedsTls(string address) =>
        $"Server:BindAddress: '{address}' is not a loopback address; serving beyond loopback needs TLS: set Server:Tls:CertificatePath and Server:Tls:KeyPath (PEM files)";

    public static string NeedsAuthentication(string address) =>
        $"Server:BindAddress: '{address}' is not a loopback address; callers must authenticate: set Server:ApiKeys:<client-name> " +
        $"(keys of at least {MinimumKeyLength} characters) or Server:Tls:ClientCertificateAuthorityPath (mTLS)";

    public static string NotSet(string key, string because) => $"{key}: not set; {because}";

    public static string FileMissing(string key, string path) => $"{key}: '{path}' does not exist";

    public static string Unreadable(string key, string path, string reason) => $"{key}: '{path}' could not be read as PEM: {reason}";

    public static string AuthorityWithoutTls => NotSet("Server:Tls:CertificatePath", "Server:Tls:ClientCertificateAuthorityPath (mTLS) needs TLS");

    public static string KeyTooShort(string client) =>
        $"Server:ApiKeys:{client}: the key is shorter than {MinimumKeyLength} characters (generate one with: openssl rand -base64 32)";

    public static string KeysNotAMap(string child) =>
        $"Server:ApiKeys:{child}: expected a map of client name to key, e.g. \"Server\": {{\"ApiKeys\": {{\"eln-prod\": \"<key>\"}}}}";

    public static string DuplicateKey(string first, string second) =>
        $"Server:ApiKeys:{second}: the same key as Server:ApiKeys:{first}; give each client its own key";

    public static string Refusal(string reason) => reason switch
    {
        MissingKey => $"unauthenticated: {MissingKey}; send the key in the {KeyHeader} header",
        NoClientCertificate => $"unauthenticated: {NoClientCertificate}; present a certificate issued by the host's client authority",
        _ => "unauthenticated: " + reason,
    };
}
