using System.Text.Json;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace ConsistencyHost.Server.Probes;

/// <summary>
/// The body of <c>/health/live</c> and <c>/health/ready</c>: the overall status and each check with its status,
/// description and data (for readiness: every rule loaded or refused, every worker's state).
/// </summary>
/// <example><code>{"status":"Degraded","checks":[{"name":"plugins","status":"Degraded","description":"1 of 7 rules refused","data":{"fixture-reflective-file":"refused (…): …"}}]}</code></example>
public static class HealthJson
{
    private static readonly JsonSerializerOptions Options = new() { PropertyNamingPolicy = JsonNamingPolicy.CamelCase };

    /// <summary>Writes the report as JSON.</summary>
    public static Task WriteAsync(HttpContext context, HealthReport report)
    {
        context.Response.ContentType = "application/json; charset=utf-8";
        var body = new
        {
            status = report.Status.ToString(),
            checks = report.Entries.Select(e => new
            {
                name = e.Key,
                status = e.Value.Status.ToString(),
                description = e.Value.Description ?? "",
                data = e.Value.Data.ToDictionary(d => d.Key, d => d.Value?.ToString() ?? "", StringComparer.Ordinal),
            }),
        };
        return context.Response.WriteAsync(JsonSerializer.Serialize(body, Options));
    }
}
