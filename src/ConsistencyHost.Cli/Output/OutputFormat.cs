using ConsistencyHost.Cli.CommandLine;

namespace ConsistencyHost.Cli.Output;

/// <summary>How a command prints its result.</summary>
internal enum OutputFormat
{
    /// <summary>For people: aligned lines.</summary>
    Text,
    /// <summary>For scripts: the proto's JSON mapping (or JSON Lines for per-molecule output).</summary>
    Json,
}

/// <summary>Reads the --format option.</summary>
internal static class OutputFormats
{
    public static OutputFormat Parse(string? value) => value switch
    {
        null or "text" => OutputFormat.Text,
        "json" => OutputFormat.Json,
        _ => throw new UsageException($"--format must be text or json, not '{value}'"),
    };
}
