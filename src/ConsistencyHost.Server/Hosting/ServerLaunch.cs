namespace ConsistencyHost.Server.Hosting;

/// <summary>What the command line hands the host at start: raw arguments plus explicit overrides.</summary>
public sealed record ServerLaunch
{
    /// <summary>Arguments passed through to configuration (e.g. --Server:Port=5200).</summary>
    public IReadOnlyList<string> Args { get; init; } = [];

    /// <summary>An extra JSON configuration file (profiles, limits); null for none.</summary>
    public string? ConfigFile { get; init; }

    /// <summary>Plugin folder override; null keeps configuration or the default beside the executable.</summary>
    public string? PluginsPath { get; init; }

    /// <summary>Port override; null keeps configuration.</summary>
    public int? Port { get; init; }

    /// <summary>JSON/HTTP port override; null keeps configuration.</summary>
    public int? HttpPort { get; init; }

    /// <summary>Address to bind (Server:BindAddress); null keeps configuration (loopback by default).</summary>
    public string? BindAddress { get; init; }

    /// <summary>Server certificate PEM file (Server:Tls:CertificatePath); null keeps configuration.</summary>
    public string? TlsCertificatePath { get; init; }

    /// <summary>Private key PEM file of that certificate (Server:Tls:KeyPath); null keeps configuration.</summary>
    public string? TlsKeyPath { get; init; }

    /// <summary>Authority client certificates must chain to (Server:Tls:ClientCertificateAuthorityPath); null keeps configuration.</summary>
    public string? ClientCertificateAuthorityPath { get; init; }

    /// <summary>Echo override (<c>serve --echo</c>); null keeps configuration (Server:EnableEcho).</summary>
    public bool? EnableEcho { get; init; }
}
