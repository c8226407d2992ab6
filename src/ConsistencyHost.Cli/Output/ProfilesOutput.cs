using System.Globalization;
using System.Text;
using System.Text.Json;

namespace ConsistencyHost.Cli.Output;

/// <summary>Prints the effective profiles for a person (text) or a script (JSON).</summary>
internal static class ProfilesOutput
{
    private static readonly JsonWriterOptions Indented = new() { Indented = true };

    public static string Text(IReadOnlyList<ProfileView> profiles)
    {
        var text = new StringBuilder();
        foreach (var profile in profiles)
        {
            text.Append(CultureInfo.InvariantCulture, $"profile {profile.Name}{(profile.IsDefault ? " (default)" : "")}\n");
            foreach (var rule in profile.Rules)
            {
                AppendRule(text, rule);
            }

            text.Append('\n');
        }

        return text.ToString();
    }

    public static string Json(IReadOnlyList<ProfileView> profiles)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, Indented))
        {
            json.WriteStartObject();
            json.WriteStartArray("profiles");
            foreach (var profile in profiles)
            {
                WriteProfile(json, profile);
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    private static void AppendRule(StringBuilder text, RuleView rule)
    {
        if (!rule.IsEnabled)
        {
            text.Append(CultureInfo.InvariantCulture, $"  {rule.Id,-24} disabled\n");
            return;
        }

        text.Append(CultureInfo.InvariantCulture, $"  {rule.Id,-24} enabled   deadline {rule.DeadlineMs:0} ms\n");
        foreach (var (name, value) in rule.Options)
        {
            text.Append(CultureInfo.InvariantCulture, $"      {name} = {value}\n");
        }

        foreach (var (code, severity) in rule.Severities)
        {
            text.Append(CultureInfo.InvariantCulture, $"      severity {code} -> {severity}\n");
        }
    }

    private static void WriteProfile(Utf8JsonWriter json, ProfileView profile)
    {
        json.WriteStartObject();
        json.WriteString("name", profile.Name);
        json.WriteBoolean("isDefault", profile.IsDefault);
        json.WriteStartArray("rules");
        foreach (var rule in profile.Rules)
        {
            json.WriteStartObject();
            json.WriteString("id", rule.Id);
            json.WriteString("version", rule.Version);
            json.WriteBoolean("enabled", rule.IsEnabled);
            if (rule.DeadlineMs is { } deadline) json.WriteNumber("deadlineMs", deadline);
            WriteMap(json, "options", rule.Options);
            WriteMap(json, "severities", rule.Severities);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteMap(Utf8JsonWriter json, string name, IReadOnlyList<KeyValuePair<string, string>> values)
    {
        json.WriteStartObject(name);
        foreach (var (key, value) in values)
        {
            json.WriteString(key, value);
        }

        json.WriteEndObject();
    }
}
