using System.Text.Json;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Tests.Shared;
using Google.Api;
using Google.Protobuf.Reflection;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// docs/api/openapi.json is written from the proto, not generated at run time; these tests hold it to the
/// compiled proto descriptor (the google.api.http rules and every message's JSON field names, as the proto3
/// JSON mapping defines them) and check that the host serves it.
/// </summary>
public sealed class OpenApiDocumentTests
{
    private static readonly JsonDocument Document = JsonDocument.Parse(File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "api", "openapi.json")));

    [Fact]
    public void Paths_MatchHttpRulesOfTheProto()
    {
        var rules = EntryCheck.Descriptor.Methods
            .Select(m => m.GetOptions()?.GetExtension(AnnotationsExtensions.Http))
            .Where(r => r is not null)
            .Select(r => r!.PatternCase == HttpRule.PatternOneofCase.Post ? $"post {r.Post}" : $"get {r.Get}")
            .Order(StringComparer.Ordinal);

        var documented = Document.RootElement.GetProperty("paths").EnumerateObject()
            .SelectMany(path => path.Value.EnumerateObject().Select(verb => $"{verb.Name} {path.Name}"))
            .Order(StringComparer.Ordinal);

        Assert.Equal(["get /v1/profiles", "get /v1/rules", "post /v1/entries:check"], rules);
        Assert.Equal(rules, documented);
    }

    [Fact]
    public void Schemas_HaveEveryFieldOfEachMessageByJsonName()
    {
        var schemas = Document.RootElement.GetProperty("components").GetProperty("schemas");
        var messages = Reachable(CheckEntryRequest.Descriptor, CheckEntryResponse.Descriptor, ListRulesResponse.Descriptor, ListProfilesResponse.Descriptor);

        foreach (var message in messages)
        {
            Assert.True(schemas.TryGetProperty(message.Name, out var schema), $"schema {message.Name} is missing");
            var documented = schema.GetProperty("properties").EnumerateObject().Select(p => p.Name).Order(StringComparer.Ordinal);
            Assert.Equal(message.Fields.InFieldNumberOrder().Select(f => f.JsonName).Order(StringComparer.Ordinal), documented);
        }
    }

    [Fact]
    public async Task Host_ServesTheDocumentAtOpenApiJson()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        using var http = new HttpClient { BaseAddress = host.HttpAddress, Timeout = TimeSpan.FromSeconds(60) };

        var served = await http.GetStringAsync("/openapi.json");

        using var parsed = JsonDocument.Parse(served);
        Assert.Equal("3.0.3", parsed.RootElement.GetProperty("openapi").GetString());
        Assert.Equal(Document.RootElement.GetRawText(), parsed.RootElement.GetRawText());
    }

    private static List<MessageDescriptor> Reachable(params MessageDescriptor[] roots)
    {
        var seen = new List<MessageDescriptor>();
        var pending = new Stack<MessageDescriptor>(roots);
        while (pending.TryPop(out var message))
        {
            if (message.File.Package != "consistencyhost.v1" || seen.Contains(message)) continue;
            seen.Add(message);
            // A map is a JSON object in the proto3 mapping (additionalProperties), not a schema of its entry type.
            foreach (var field in message.Fields.InFieldNumberOrder().Where(f => f.FieldType == FieldType.Message))
            {
                var type = !field.IsMap ? field.MessageType
                    : field.MessageType.FindFieldByNumber(2) is { FieldType: FieldType.Message } value ? value.MessageType : null;
                if (type is not null) pending.Push(type);
            }
        }

        return seen;
    }
}
