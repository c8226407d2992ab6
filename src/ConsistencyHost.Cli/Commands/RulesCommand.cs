using System.Globalization;
using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Cli.Output;
using ConsistencyHost.Contract.Mapping;

namespace ConsistencyHost.Cli.Commands;

/// <summary><c>rules</c>: lists the rules the engine discovers, loaded or refused, with the reason.</summary>
internal static class RulesCommand
{
    private static readonly Dictionary<string, string> Valued = new(EngineFactory.EngineOptions, StringComparer.Ordinal)
    {
        ["--format"] = "--format",
    };

    public const string Usage = "rules [--format text|json] [--plugins DIR] [--config FILE]";

    public static int Run(IReadOnlyList<string> raw, TextWriter stdout)
    {
        var args = ParsedArguments.Parse(raw, Valued, []);
        var format = OutputFormats.Parse(args.Value("--format"));
        var list = ReportMapper.ToRuleList(EngineFactory.Create(args));
        if (format == OutputFormat.Json)
        {
            stdout.Write(JsonOutput.Format(list) + "\n");
            return ExitCodes.Ok;
        }

        foreach (var rule in list.Rules)
        {
            var status = rule.LoadStatus switch
            {
                Contract.V1.RuleLoadStatus.Loaded => "loaded",
                Contract.V1.RuleLoadStatus.Quarantined => "QUARANTINED: " + rule.LoadMessage,
                _ => "REFUSED: " + rule.LoadMessage,
            };
            stdout.Write(string.Create(CultureInfo.InvariantCulture, $"{rule.Id,-24} {rule.Version,-8} {rule.Plugin,-48} {rule.Isolation,-10} {status}\n"));
            if (rule.Title.Length > 0) stdout.Write($"    {rule.Title}\n");
        }

        if (list.Rules.Count == 0) stdout.Write("No rules found.\n");
        return ExitCodes.Ok;
    }
}
