using System.Text.Json;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Tests.Shared;
using Google.Protobuf.Reflection;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// docs/api/reports.schema.json (one line of reports.jsonl) held to the compiled proto descriptor of
/// CheckEntryResponse: every message it reaches has a definition with exactly its fields by JSON name, required
/// except singular message fields (the CLI writes defaults, absent messages are left out), and every enum lists
/// exactly its value names, as the proto3 JSON mapping writes them. The CLI tests validate real output against it.
/// </summary>
public sealed class ReportsSchemaDocumentTests
{
    private static readonly JsonElement Schema = JsonDocument.Parse(File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "api", "reports.schema.json"))).RootElement;

    [Fact]
    public void Schema_EveryMessageAndEnumMatchesTheProto()
    {
        var checkedTypes = new HashSet<string>(StringComparer.Ordinal);
        AssertMessage(Schema, CheckEntryResponse.Descriptor, checkedTypes);

        Assert.Equal(
            Schema.GetProperty("$defs").EnumerateObject().Select(d => d.Name).Order(StringComparer.Ordinal),
            checkedTypes.Where(t => t != CheckEntryResponse.Descriptor.Name).Order(StringComparer.Ordinal));
    }

    private static void AssertMessage(JsonElement schema, MessageDescriptor message, HashSet<string> checkedTypes)
    {
        if (!checkedTypes.Add(message.Name)) return;
        var fields = message.Fields.InFieldNumberOrder();
        var properties = schema.GetProperty("properties");
        Assert.Equal(fields.Select(f => f.JsonName).Order(StringComparer.Ordinal), properties.EnumerateObject().Select(p => p.Name).Order(StringComparer.Ordinal));
        Assert.Equal(
            fields.Where(f => f.IsRepeated || f.FieldType != FieldType.Message).Select(f => f.JsonName).Order(StringComparer.Ordinal),
            schema.GetProperty("required").EnumerateArray().Select(r => r.GetString()!).Order(StringComparer.Ordinal));
        Assert.False(schema.GetProperty("additionalProperties").GetBoolean(), $"{message.Name} allows unknown properties");
        foreach (var field in fields.Where(f => f.FieldType is FieldType.Message or FieldType.Enum))
        {
            var property = properties.GetProperty(field.JsonName);
            var reference = (field.IsRepeated ? property.GetProperty("items") : property).GetProperty("$ref").GetString()!;
            var name = reference["#/$defs/".Length..];
            var definition = Schema.GetProperty("$defs").GetProperty(name);
            if (field.FieldType == FieldType.Enum)
            {
                Assert.Equal(field.EnumType.Name, name);
                checkedTypes.Add(name);
                Assert.Equal(field.EnumType.Values.Select(v => v.Name), definition.GetProperty("enum").EnumerateArray().Select(v => v.GetString()));
                continue;
            }

            Assert.Equal(field.MessageType.Name, name);
            AssertMessage(definition, field.MessageType, checkedTypes);
        }
    }
}
