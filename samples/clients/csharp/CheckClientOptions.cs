namespace ConsistencyHost.Client;

/// <summary>How <see cref="CheckClient"/> talks to the host.</summary>
public sealed record CheckClientOptions
{
    /// <summary>Defaults: 5 attempts, 0.2 s first back-off, 30 s per call.</summary>
    public static CheckClientOptions Default { get; } = new();

    /// <summary>Attempts per call, the first included (gRPC caps this at 5).</summary>
    public int MaxAttempts { get; init; } = 5;

    /// <summary>Back-off before the first retry; it grows 1.5-fold per retry (with gRPC's random jitter).</summary>
    public TimeSpan InitialBackoff { get; init; } = TimeSpan.FromMilliseconds(200);

    /// <summary>Longest back-off between two attempts.</summary>
    public TimeSpan MaxBackoff { get; init; } = TimeSpan.FromSeconds(3);

    /// <summary>Deadline of one call, retries included (deadlines span retries in gRPC).</summary>
    public TimeSpan CallTimeout { get; init; } = TimeSpan.FromSeconds(30);

    /// <summary>
    /// The key the host issued to this client, sent in the <c>x-api-key</c> metadata of every call; null sends none
    /// (a loopback host without keys). Read it from a secret store or a file, not from source code.
    /// </summary>
    public string? ApiKey { get; init; }

    /// <summary>A handler to send through (tests, proxies); null uses a pooled SocketsHttpHandler.</summary>
    public HttpMessageHandler? HttpHandler { get; init; }
}
