using System.Globalization;
using ConsistencyHost.Server.Services;
using Grpc.Core;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Http;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Gives every call a request id, on both ports: the <c>x-request-id</c> header the client sent (gRPC metadata is
/// HTTP/2 headers), or a new one. The id is written back into the request headers (so the services read it where
/// a client's would be, <see cref="Of"/>) and into the response headers before anything else answers, so that
/// refusals further down (access, size, unknown fields, INVALID_ARGUMENT) carry it too.
/// </summary>
/// <remarks>
/// A client's id goes into log lines and trace tags, so it is held to what a log store takes safely: 1 to
/// <see cref="MaxLength"/> visible ASCII characters. Anything else is refused as INVALID_ARGUMENT naming the
/// header rather than replaced, so a client that thinks it is correlating its calls learns that it is not.
/// </remarks>
public static class RequestIds
{
    /// <summary>The header (gRPC metadata key) that carries the id both ways.</summary>
    public const string Header = "x-request-id";

    /// <summary>The longest id a client may send.</summary>
    public const int MaxLength = 128;

    /// <summary>Adds the middleware; first in the pipeline.</summary>
    public static void Use(IApplicationBuilder app, ServerEndpoints endpoints) =>
        app.Use(async (context, next) =>
        {
            var sent = context.Request.Headers[Header];
            var problem = sent.Count == 0 ? null : Problem(sent);
            var id = sent.Count == 0 || problem is not null ? New() : sent[0]!;
            context.Request.Headers[Header] = id;
            context.Response.Headers[Header] = id;
            if (problem is null)
            {
                await next(context);
                return;
            }

            var status = BadRequestStatus.For(Header, problem);
            if (context.Connection.LocalPort == endpoints.Grpc.Port)
            {
                RefuseGrpc(context.Response, status);
                return;
            }

            context.Response.StatusCode = StatusCodes.Status400BadRequest;
            context.Response.ContentType = "application/json";
            await context.Response.WriteAsync(BadRequestStatus.ToJson(status));
        });

    /// <summary>The call's request id, as the middleware left it in the request headers; empty outside a host.</summary>
    public static string Of(ServerCallContext context) => context.RequestHeaders.GetValue(Header) ?? "";

    /// <summary>What is wrong with a sent id, or null when it is acceptable.</summary>
    public static string? Problem(IReadOnlyList<string?> values)
    {
        if (values.Count > 1) return $"sent {values.Count} times; expected one request id";
        var value = values[0] ?? "";
        if (value.Length is 0 or > MaxLength)
        {
            return string.Create(CultureInfo.InvariantCulture, $"{value.Length} characters; expected 1 to {MaxLength} visible ASCII characters");
        }

        var bad = value.IndexOfAnyExceptInRange('!', '~');
        return bad < 0
            ? null
            : string.Create(CultureInfo.InvariantCulture, $"character {bad} (U+{(int)value[bad]:X4}) is not allowed; expected 1 to {MaxLength} visible ASCII characters");
    }

    /// <summary>A new id: 32 lower-case hex digits (a random GUID's "N" form).</summary>
    public static string New() => Guid.NewGuid().ToString("N");

    // A trailers-only response (gRPC over HTTP/2 spec): status and trailers in the one HEADERS frame.
    private static void RefuseGrpc(HttpResponse response, Google.Rpc.Status status)
    {
        response.StatusCode = StatusCodes.Status200OK;
        response.ContentType = "application/grpc";
        response.Headers["grpc-status"] = status.Code.ToString(CultureInfo.InvariantCulture);
        response.Headers["grpc-message"] = Uri.EscapeDataString(status.Message);
        foreach (var trailer in BadRequestStatus.Trailers(status, Header))
        {
            response.Headers[trailer.Key] = trailer.IsBinary ? Convert.ToBase64String(trailer.ValueBytes) : trailer.Value;
        }
    }
}
