using System.Text.Json;
using Google.Protobuf.Reflection;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Finds the JSON properties of a request body that name no field of the request message. JSON transcoding
/// ignores them, so a misspelt field ("structur") would otherwise give a clean report for an entry that was never
/// read; the CLI's batch reader refuses the same mistake. Paths use the proto field names with [index] for
/// repeated fields, as the engine's input errors do ("spectra[1].reported_text").
/// </summary>
public static class JsonFieldCheck
{
    /// <summary>At most this many unknown fields are listed in one answer.</summary>
    public const int MaxListed = 10;

    /// <summary>The unknown fields of <paramref name="body"/> read as <paramref name="message"/>, in document order.</summary>
    public static IReadOnlyList<UnknownField> Find(JsonElement body, MessageDescriptor message)
    {
        var found = new List<UnknownField>();
        Walk(body, message, "", found);
        return found;
    }

    private static void Walk(JsonElement json, MessageDescriptor message, string path, List<UnknownField> found)
    {
        // Well-known types (Struct, Value, Any, wrappers, Timestamp) have JSON forms of their own.
        if (json.ValueKind != JsonValueKind.Object || message.File.Package == "google.protobuf") return;

        foreach (var property in json.EnumerateObject())
        {
            if (found.Count >= MaxListed) return;
            var field = FieldNamed(message, property.Name);
            if (field is null)
            {
                found.Add(new UnknownField(Join(path, property.Name), message.Fields.InDeclarationOrder().Select(f => f.JsonName).ToArray()));
                continue;
            }

            WalkValue(property.Value, field, Join(path, field.Name), found);
        }
    }

    private static void WalkValue(JsonElement value, FieldDescriptor field, string path, List<UnknownField> found)
    {
        if (field.IsMap)
        {
            var valueField = field.MessageType.FindFieldByNumber(2);
            if (value.ValueKind != JsonValueKind.Object || valueField.FieldType != FieldType.Message) return;
            foreach (var entry in value.EnumerateObject())
                Walk(entry.Value, valueField.MessageType, $"{path}[{entry.Name}]", found);
            return;
        }

        if (field.FieldType != FieldType.Message) return;
        if (field.IsRepeated && value.ValueKind == JsonValueKind.Array)
        {
            var index = 0;
            foreach (var item in value.EnumerateArray())
                Walk(item, field.MessageType, $"{path}[{index++}]", found);
            return;
        }

        Walk(value, field.MessageType, path, found);
    }

    // The transcoder accepts the lowerCamelCase JSON name and the proto field name (proto3 JSON mapping).
    private static FieldDescriptor? FieldNamed(MessageDescriptor message, string name)
    {
        foreach (var field in message.Fields.InDeclarationOrder())
        {
            if (field.JsonName == name || field.Name == name) return field;
        }

        return null;
    }

    private static string Join(string path, string name) => path.Length == 0 ? name : $"{path}.{name}";
}

/// <summary>A JSON property with no field of that name, and the names that were expected there.</summary>
/// <param name="Path">Where it is, e.g. "structure.smile".</param>
/// <param name="Expected">The JSON names of the message's fields at that place.</param>
public sealed record UnknownField(string Path, IReadOnlyList<string> Expected);
