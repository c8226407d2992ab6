using ConsistencyHost.Server.Hosting;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Access;

/// <summary>
/// Lets a call through only when it authenticates as <see cref="AccessPolicy"/> demands: a client certificate
/// chained to the configured authority (mTLS), and/or a configured key in the <c>x-api-key</c> header. When both
/// are configured both are required. Health (<c>grpc.health.v1.Health</c>, any path under <c>/health/</c>) stays
/// anonymous for probes; everything else — the check service, reflection, /openapi.json — is gated.
/// </summary>
/// <remarks>
/// A middleware rather than a gRPC interceptor so that one check covers both ports, the transcoded JSON calls and
/// /openapi.json, and runs before the concurrency gate: an unauthenticated call never takes a slot. A refusal is
/// gRPC status UNAUTHENTICATED on the gRPC port (a trailers-only response, gRPC over HTTP/2 spec) and HTTP 401 with
/// a google.rpc.Status body on the JSON port.
/// </remarks>
public static class AccessGate
{
    // google.rpc.Code UNAUTHENTICATED (googleapis/googleapis google/rpc/code.proto); the gRPC status code is the same.
    private const int Unauthenticated = 16;

    /// <summary>Adds the middleware when <paramref name="policy"/> requires authentication.</summary>
    public static void Use(WebApplication app, ServerEndpoints endpoints, AccessPolicy policy)
    {
        if (!policy.RequiresAuthentication) return;
        var logger = app.Services.GetRequiredService<ILoggerFactory>().CreateLogger(typeof(AccessGate).FullName!);
        app.Use(async (context, next) =>
        {
            if (IsHealth(context.Request.Path))
            {
                await next(context);
                return;
            }

            var (client, reason) = await Authenticate(context, policy);
            var remote = $"{context.Connection.RemoteIpAddress}:{context.Connection.RemotePort}";
            if (reason is not null)
            {
                AccessLog.CallRefused(logger, context.Request.Path, remote, reason);
                await RefuseAsync(context, context.Connection.LocalPort == endpoints.Grpc.Port, reason, policy.Keys.Count > 0);
                return;
            }

            AccessLog.CallAccepted(logger, context.Request.Path, remote, client!);
            await next(context);
        });
    }

    private static bool IsHealth(PathString path) =>
        path.StartsWithSegments("/grpc.health.v1.Health", StringComparison.OrdinalIgnoreCase) ||
        path.StartsWithSegments("/health", StringComparison.OrdinalIgnoreCase);

    private static async Task<(string? Client, string? Reason)> Authenticate(HttpContext context, AccessPolicy policy)
    {
        string? client = null;
        if (policy.RequiresClientCertificate)
        {
            var certificate = await context.Connection.GetClientCertificateAsync(context.RequestAborted);
            if (certificate is null) return (null, AccessMessages.NoClientCertificate);
            if (!ClientCertificates.IsTrusted(certificate, policy.ClientAuthorities)) return (null, AccessMessages.UntrustedClientCertificate);
            client = ClientCertificates.ClientName(certificate);
        }

        if (policy.Keys.Count == 0) return (client, null);
        var presented = context.Request.Headers[AccessMessages.KeyHeader].ToString();
        if (presented.Length == 0) return (null, AccessMessages.MissingKey);
        return policy.Keys.ClientOf(presented) is { } name ? (name, null) : (null, AccessMessages.UnknownKey);
    }

    private static Task RefuseAsync(HttpContext context, bool grpc, string reason, bool keys)
    {
        var message = AccessMessages.Refusal(reason);
        if (grpc)
        {
            context.Response.StatusCode = StatusCodes.Status200OK;
            context.Response.ContentType = "application/grpc";
            context.Response.Headers["grpc-status"] = Unauthenticated.ToString(System.Globalization.CultureInfo.InvariantCulture);
            context.Response.Headers["grpc-message"] = message;
            return Task.CompletedTask;
        }

        context.Response.StatusCode = StatusCodes.Status401Unauthorized;
        // RFC 9110 section 11.6.1: a 401 names the scheme to use; the key travels in its own header.
        if (keys) context.Response.Headers.WWWAuthenticate = $"ApiKey header=\"{AccessMessages.KeyHeader}\"";
        return context.Response.WriteAsJsonAsync(new { code = Unauthenticated, message, details = Array.Empty<object>() });
    }
}
