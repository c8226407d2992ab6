using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;
using ConsistencyHost.Cli.CommandLine;
using Grpc.Net.Client;

namespace ConsistencyHost.Cli.Remote;

/// <summary>
/// Opens the channel a client command (batch --server) uses: http:// or https:// (optionally trusting a private
/// CA from --ca-cert instead of the system's), with the API key from --api-key-file or CONSISTENCYHOST_API_KEY
/// sent in the x-api-key header of every call. The key is never taken as a flag: flags show in ps.
/// </summary>
internal static class ServerChannel
{
    /// <summary>The environment variable read when no --api-key-file is given.</summary>
    public const string KeyVariable = "CONSISTENCYHOST_API_KEY";

    /// <summary>Reads one --server address: http:// or https://, absolute.</summary>
    public static Uri Address(string server) =>
        Uri.TryCreate(server, UriKind.Absolute, out var address) && address.Scheme is "http" or "https"
            ? address
            : throw new UsageException($"--server must be an http:// or https:// address, not '{server}'");

    public static GrpcChannel Open(string server, ParsedArguments args)
    {
        var address = Address(server);
        var handler = new SocketsHttpHandler();
        if (args.Value("--ca-cert") is { } authority) Trust(handler, address, authority);
        var key = ReadKey(args.Value("--api-key-file"));
        return GrpcChannel.ForAddress(address, new GrpcChannelOptions { HttpHandler = key is null ? handler : new ApiKeyHandler(key, handler) });
    }

    private static void Trust(SocketsHttpHandler handler, Uri address, string path)
    {
        if (address.Scheme != "https") throw new UsageException($"--ca-cert applies to https:// addresses; '{address}' is not one");
        if (!File.Exists(path)) throw new UsageException($"--ca-cert '{path}' does not exist");
        var authorities = new X509Certificate2Collection();
        try
        {
            authorities.ImportFromPemFile(path);
        }
        catch (CryptographicException error)
        {
            throw new UsageException($"--ca-cert '{path}' could not be read as PEM: {error.Message}");
        }

        if (authorities.Count == 0) throw new UsageException($"--ca-cert '{path}' holds no CERTIFICATE block");
        // Only this CA is trusted, for this connection; the host name check stays on.
        handler.SslOptions.CertificateChainPolicy = new X509ChainPolicy { TrustMode = X509ChainTrustMode.CustomRootTrust, RevocationMode = X509RevocationMode.NoCheck };
        handler.SslOptions.CertificateChainPolicy.CustomTrustStore.AddRange(authorities);
    }

    private static string? ReadKey(string? file)
    {
        if (file is null) return Environment.GetEnvironmentVariable(KeyVariable) is { Length: > 0 } fromEnvironment ? fromEnvironment.Trim() : null;
        if (!File.Exists(file)) throw new UsageException($"--api-key-file '{file}' does not exist");
        // A key file written by echo or an editor ends with a newline that is not part of the key.
        var key = File.ReadAllText(file).Trim();
        return key.Length > 0 ? key : throw new UsageException($"--api-key-file '{file}' is empty");
    }

    /// <summary>Adds the key to every request; gRPC metadata travels as HTTP/2 headers.</summary>
    private sealed class ApiKeyHandler(string key, HttpMessageHandler inner) : DelegatingHandler(inner)
    {
        protected override Task<HttpResponseMessage> SendAsync(HttpRequestMessage request, CancellationToken cancellationToken)
        {
            request.Headers.Add("x-api-key", key);
            return base.SendAsync(request, cancellationToken);
        }
    }
}
