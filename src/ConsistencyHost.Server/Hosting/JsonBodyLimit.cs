using System.Globalization;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Http;
using Microsoft.AspNetCore.Http.Features;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Holds a JSON request on the HTTP/1.1 port to the same size limit as a gRPC message
/// (<see cref="ServerOptions.MaxReceiveMessageBytes"/>). A body whose Content-Length is over the limit is
/// refused before it is read: 413 with a google.rpc.Status body, code RESOURCE_EXHAUSTED as gRPC reports it.
/// A chunked body without a length stops at the limit too (JSON transcoding then answers 400). Set per request
/// rather than on Kestrel as a whole, because a gRPC stream of many entries may rightly carry more bytes.
/// </summary>
public static class JsonBodyLimit
{
    // google.rpc.Code RESOURCE_EXHAUSTED (googleapis/googleapis google/rpc/code.proto).
    private const int ResourceExhausted = 8;

    /// <summary>Adds the middleware.</summary>
    public static void Use(IApplicationBuilder app, ServerEndpoints endpoints, long maxBytes) =>
        app.Use(async (context, next) =>
        {
            if (context.Connection.LocalPort != endpoints.Http.Port)
            {
                await next(context);
                return;
            }

            if (context.Request.ContentLength > maxBytes)
            {
                await RefuseAsync(context.Response, context.Request.ContentLength.Value, maxBytes);
                return;
            }

            if (context.Features.Get<IHttpMaxRequestBodySizeFeature>() is { IsReadOnly: false } limit)
            {
                limit.MaxRequestBodySize = maxBytes;
            }

            await next(context);
        });

    private static Task RefuseAsync(HttpResponse response, long length, long maxBytes)
    {
        response.StatusCode = StatusCodes.Status413PayloadTooLarge;
        var message = string.Create(CultureInfo.InvariantCulture,
            $"request body is {length} bytes; the largest accepted is {maxBytes} bytes (Server:MaxReceiveMessageBytes)");
        return response.WriteAsJsonAsync(new { code = ResourceExhausted, message, details = Array.Empty<object>() });
    }
}
