using System.Globalization;
using System.Text.Json;
using ConsistencyHost.Contract.V1;
using Google.Protobuf.Reflection;
using Grpc.AspNetCore.Server;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Http;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Reads a JSON request body on the HTTP/1.1 port before JSON transcoding sees it, and refuses what transcoding
/// would mishandle:
/// <list type="bullet">
/// <item>over the size limit of a gRPC message (<see cref="ServerOptions.MaxReceiveMessageBytes"/>): 413 with a
/// google.rpc.Status body, code RESOURCE_EXHAUSTED as gRPC reports it — from Content-Length before reading, and
/// for a chunked body without a length once the limit is passed (transcoding alone would answer 400);</item>
/// <item>not JSON: 400 with the line and column of the first syntax error;</item>
/// <item>a property that names no field of the request message (transcoding ignores it): 400 with each such
/// field's path, also as a google.rpc.BadRequest detail.</item>
/// </list>
/// The limit is set per request rather than on Kestrel as a whole, because a gRPC stream of many entries may
/// rightly carry more bytes.
/// </summary>
public static class JsonBodyLimit
{
    // google.rpc.Code values (googleapis/googleapis google/rpc/code.proto).
    private const int InvalidArgument = 3;
    private const int ResourceExhausted = 8;
    private const string BadRequestType = "type.googleapis.com/google.rpc.BadRequest";

    /// <summary>Adds the middleware.</summary>
    public static void Use(IApplicationBuilder app, ServerEndpoints endpoints, long maxBytes) =>
        app.Use(async (context, next) =>
        {
            if (context.Connection.LocalPort != endpoints.Http.Port || !HasBody(context.Request))
            {
                await next(context);
                return;
            }

            if (context.Request.ContentLength > maxBytes)
            {
                await RefuseSizeAsync(context.Response, $"request body is {context.Request.ContentLength.Value} bytes", maxBytes);
                return;
            }

            var body = await ReadBoundedAsync(context.Request.Body, maxBytes, context.RequestAborted);
            if (body is null)
            {
                await RefuseSizeAsync(context.Response, "request body (sent without a length) passed the limit", maxBytes);
                return;
            }

            var problem = Inspect(body, RequestMessage(context));
            if (problem is not null)
            {
                context.Response.StatusCode = StatusCodes.Status400BadRequest;
                await context.Response.WriteAsJsonAsync(problem);
                return;
            }

            context.Request.Body = new MemoryStream(body, writable: false);
            context.Request.ContentLength = body.Length;
            await next(context);
        });

    private static bool HasBody(HttpRequest request) =>
        request.ContentLength > 0 || (request.ContentLength is null && request.Headers.TransferEncoding.Count > 0);

    /// <summary>The whole body, or null when it is longer than <paramref name="maxBytes"/>.</summary>
    private static async Task<byte[]?> ReadBoundedAsync(Stream body, long maxBytes, CancellationToken cancel)
    {
        using var buffer = new MemoryStream();
        var chunk = new byte[81920];
        int read;
        while ((read = await body.ReadAsync(chunk, cancel)) > 0)
        {
            if (buffer.Length + read > maxBytes) return null;
            buffer.Write(chunk, 0, read);
        }

        return buffer.ToArray();
    }

    /// <summary>The input message of the gRPC method the request is routed to, when its HTTP rule takes the whole body.</summary>
    private static MessageDescriptor? RequestMessage(HttpContext context)
    {
        var method = context.GetEndpoint()?.Metadata.GetMetadata<GrpcMethodMetadata>()?.Method;
        if (method is null) return null;
        return ContractServices.Value
            .FirstOrDefault(s => s.FullName == method.ServiceName)?
            .FindMethodByName(method.Name)?
            .InputType;
    }

    private static readonly Lazy<IReadOnlyList<ServiceDescriptor>> ContractServices = new(() =>
        [.. CheckReflection.Descriptor.Services, .. DiagnosticsReflection.Descriptor.Services]);

    private static object? Inspect(byte[] body, MessageDescriptor? message)
    {
        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(body);
        }
        catch (JsonException error)
        {
            var where = error.LineNumber is { } line
                ? string.Create(CultureInfo.InvariantCulture, $" at line {line + 1}, column {error.BytePositionInLine + 1 ?? 1}")
                : "";
            return Status(InvalidArgument, $"request body is not valid JSON{where}: {FirstSentence(error.Message)}", []);
        }

        using (document)
        {
            if (message is null) return null;
            var unknown = JsonFieldCheck.Find(document.RootElement, message);
            if (unknown.Count == 0) return null;
            var first = unknown[0];
            var text = $"{first.Path}: unknown field; expected one of {string.Join(", ", first.Expected)}"
                + (unknown.Count > 1 ? $" (and {unknown.Count - 1} more unknown: {string.Join(", ", unknown.Skip(1).Select(u => u.Path))})" : "");
            var violations = unknown.Select(u => new { field = u.Path, description = $"unknown field; expected one of {string.Join(", ", u.Expected)}" }).ToArray();
            return Status(InvalidArgument, text, [new Dictionary<string, object> { ["@type"] = BadRequestType, ["fieldViolations"] = violations }]);
        }
    }

    // System.Text.Json appends "Path: $ | LineNumber: … | BytePositionInLine: …"; the position is given once, above.
    private static string FirstSentence(string message)
    {
        var cut = message.IndexOf(" Path:", StringComparison.Ordinal);
        return cut > 0 ? message[..cut] : message;
    }

    // A google.rpc.Status in its JSON mapping, as transcoding writes its own errors.
    private static object Status(int code, string message, object[] details) => new { code, message, details };

    private static Task RefuseSizeAsync(HttpResponse response, string what, long maxBytes)
    {
        response.StatusCode = StatusCodes.Status413PayloadTooLarge;
        var message = string.Create(CultureInfo.InvariantCulture,
            $"{what}; the largest accepted is {maxBytes} bytes (Server:MaxReceiveMessageBytes)");
        return response.WriteAsJsonAsync(new { code = ResourceExhausted, message, details = Array.Empty<object>() });
    }
}
