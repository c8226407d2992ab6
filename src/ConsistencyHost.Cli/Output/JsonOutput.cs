using Google.Protobuf;

namespace ConsistencyHost.Cli.Output;

/// <summary>
/// Writes messages in the proto JSON mapping (lowerCamelCase field names), including fields at their default
/// values so that scripts always find "findings" and "ruleRuns", even when empty.
/// </summary>
internal static class JsonOutput
{
    private static readonly JsonFormatter Formatter = new(JsonFormatter.Settings.Default.WithFormatDefaultValues(true));

    public static string Format(IMessage message) => Formatter.Format(message);
}
