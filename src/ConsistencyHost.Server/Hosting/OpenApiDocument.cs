using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Http;
using Microsoft.AspNetCore.Routing;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Serves the OpenAPI description of the JSON/HTTP face at <c>GET /openapi.json</c>. The document is
/// docs/api/openapi.json, written from the proto's <c>google.api.http</c> rules and embedded at build time;
/// a test holds it to the proto descriptor so that the two cannot drift apart.
/// </summary>
public static class OpenApiDocument
{
    /// <summary>The route the document is served at.</summary>
    public const string Route = "/openapi.json";

    private const string ResourceName = "ConsistencyHost.Server.openapi.json";

    /// <summary>The document's text, as embedded.</summary>
    public static string Text { get; } = Load();

    /// <summary>Maps the route.</summary>
    public static void Map(IEndpointRouteBuilder endpoints) =>
        endpoints.MapGet(Route, () => Results.Text(Text, "application/json"));

    private static string Load()
    {
        using var stream = typeof(OpenApiDocument).Assembly.GetManifestResourceStream(ResourceName)
            ?? throw new InvalidOperationException($"embedded resource {ResourceName} is missing from the build");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
