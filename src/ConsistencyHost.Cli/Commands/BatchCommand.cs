using ConsistencyHost.Cli.Batch;
using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Dispatch;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// <c>batch</c>: checks a folder of entry files or an SD file, streaming, with the embedded engine or running hosts
/// (--server, one address or several, comma-separated or repeated), and writes reports.jsonl and report.html into
/// --out. Exit 0 when no entry has an error finding, 1 when one has (an unreadable entry counts), 2 for unusable
/// input or command line (with --server: a repeated entry id, or no host answering).
/// </summary>
internal static class BatchCommand
{
    private static readonly Dictionary<string, string> Valued = new(EngineFactory.EngineOptions, StringComparer.Ordinal)
    {
        ["--out"] = "--out",
        ["--profile"] = "--profile",
        ["--server"] = "--server",
    };

    public const string Usage = "batch (DIR | FILE.sdf) --out DIR [--profile NAME] [--config FILE] [--plugins DIR] [--server URL[,URL...]]";

    public static async Task<int> RunAsync(IReadOnlyList<string> raw, TextWriter stdout)
    {
        var args = ParsedArguments.Parse(raw, Valued, []);
        var (input, source) = OpenSource(args);
        var outFolder = args.Value("--out") ?? throw new UsageException("batch needs --out DIR for reports.jsonl and report.html");
        var total = source.Count();
        if (total == 0) throw new UsageException($"'{input}' holds no entries (expected *.json entry files or SD records)");
        var profile = args.Value("--profile");
        var items = source.Read().Select(item => WithProfile(item, profile));

        using var dispatcher = args.Has("--server") ? OpenDispatcher(args) : null;
        var remote = dispatcher is null ? null : new RemoteChecker(dispatcher);
        IBatchChecker checker = remote ?? (IBatchChecker)new EmbeddedChecker(EngineFactory.Create(args));
        using var outputs = new BatchOutputs(outFolder);
        var progress = new BatchProgress(Console.Error, total, TimeProvider.System, inPlace: !Console.IsErrorRedirected);
        await foreach (var (item, response) in checker.CheckAsync(items, CancellationToken.None))
        {
            outputs.Add(item, response);
            progress.Advance();
        }

        progress.Finish();
        if (remote?.Summary is { } summary) await Console.Error.WriteLineAsync($"batch: {summary}");
        outputs.Complete($"ConsistencyHost batch report: {Path.GetFileName(Path.TrimEndingDirectorySeparator(input))}");
        await stdout.WriteLineAsync($"{outputs.Entries} entries, {outputs.WithErrors} with an error or unreadable; wrote {Path.Combine(outFolder, BatchOutputs.JsonLinesName)} and {Path.Combine(outFolder, BatchOutputs.HtmlName)}");
        return outputs.WithErrors > 0 ? ExitCodes.ErrorFindings : ExitCodes.Ok;
    }

    private static (string Input, IBatchSource Source) OpenSource(ParsedArguments args)
    {
        if (args.Positional.Count != 1) throw new UsageException("batch takes one input: a folder of entry .json files or an .sdf file");
        var input = args.Positional[0];
        if (Directory.Exists(input)) return (input, new EntryFolderSource(input));
        if (File.Exists(input)) return (input, new SdFileSource(input));
        throw new UsageException($"batch input '{input}' does not exist");
    }

    private static ReplicaDispatcher OpenDispatcher(ParsedArguments args)
    {
        if (args.Has("--plugins") || args.Has("--config"))
        {
            throw new UsageException("--plugins and --config configure the embedded engine; with --server the host's own configuration applies");
        }

        var addresses = args.Values("--server").SelectMany(value => value.Split(',', StringSplitOptions.TrimEntries)).Select(ServerAddress).ToList();
        var repeated = addresses.GroupBy(address => address).FirstOrDefault(group => group.Count() > 1);
        if (repeated is not null) throw new UsageException($"--server lists {repeated.Key} twice; give each host once");
        return ReplicaDispatcher.Connect(addresses);
    }

    private static Uri ServerAddress(string text)
    {
        if (text.Length == 0) throw new UsageException("--server has an empty address; expected URL or URL1,URL2,... (http:// or https://)");
        return Uri.TryCreate(text, UriKind.Absolute, out var address) && address.Scheme is "http" or "https"
            ? address
            : throw new UsageException($"--server must be an http:// or https:// address, not '{text}'");
    }

    private static BatchItem WithProfile(BatchItem item, string? profile)
    {
        if (profile is not null && item.Request is { } request) request.Profile = profile;
        return item;
    }
}
