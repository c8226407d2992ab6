using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Cli.Output;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// <c>profiles</c>: prints the effective profiles after the configuration has been validated against the
/// loaded rules: each rule enabled or disabled, every option with its effective value (defaults included),
/// severity overrides and the deadline. A bad configuration exits 2 with every problem, as at host start.
/// </summary>
internal static class ProfilesCommand
{
    private static readonly Dictionary<string, string> Valued = new(EngineFactory.EngineOptions, StringComparer.Ordinal)
    {
        ["--format"] = "--format",
    };

    public const string Usage = "profiles [--format text|json] [--plugins DIR] [--config FILE]";

    public static int Run(IReadOnlyList<string> raw, TextWriter stdout)
    {
        var args = ParsedArguments.Parse(raw, Valued, []);
        var format = OutputFormats.Parse(args.Value("--format"));
        if (args.Positional.Count > 0) throw new UsageException($"profiles takes no positional argument, got '{args.Positional[0]}'");
        var profiles = ProfileView.All(EngineFactory.Create(args));
        stdout.Write(format == OutputFormat.Json ? ProfilesOutput.Json(profiles) : ProfilesOutput.Text(profiles));
        return ExitCodes.Ok;
    }
}
