using ConsistencyHost.Cli.Batch;
using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Cli.Remote;
using Grpc.Core;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// <c>batch</c>: checks a folder of entry files or an SD file, streaming, with the embedded engine or running hosts
/// (--server, one address or several, comma-separated or repeated; --api-key-file or CONSISTENCYHOST_API_KEY and
/// --ca-cert for hosts that demand them), and writes reports.jsonl and report.html into --out. Exit 0 when no entry
/// has an error finding, 1 when one has (an unreadable entry counts), 2 for unusable input or command line (with
/// --server: a repeated entry id, no host answering, or a host that refuses the caller).
/// </summary>
internal static class BatchCommand
{
    private static readonly Dictionary<string, string> Valued = new(EngineFactory.EngineOptions, StringComparer.Ordinal)
    {
        ["--out"] = "--out",
        ["--profile"] = "--profile",
        ["--server"] = "--server",
        ["--api-key-file"] = "--api-key-file",
        ["--ca-cert"] = "--ca-cert",
    };

    public const string Usage = "batch (DIR | FILE.sdf) --out DIR [--profile NAME] [--strict] [--config FILE] [--plugins DIR]\n" +
        "      [--server URL[,URL...] [--api-key-file PATH] [--ca-cert PATH]]   (key also from env CONSISTENCYHOST_API_KEY)";

    public static async Task<int> RunAsync(IReadOnlyList<string> raw, TextWriter stdout)
    {
        var args = ParsedArguments.Parse(raw, Valued, ["--strict"]);
        var (input, source) = OpenSource(args);
        var outFolder = args.Value("--out") ?? throw new UsageException("batch needs --out DIR for reports.jsonl and report.html");
        var total = source.Count();
        if (total == 0) throw new UsageException($"'{input}' holds no entries (expected *.json entry files or SD records)");
        var profile = args.Value("--profile");
        var strict = args.Has("--strict");
        var items = source.Read().Select(item => WithProfile(item, profile, strict));

        if (!args.Has("--server") && (args.Has("--api-key-file") || args.Has("--ca-cert")))
        {
            throw new UsageException("--api-key-file and --ca-cert apply to hosts given with --server");
        }

        using var hosts = args.Has("--server") ? OpenHosts(args) : null;
        var remote = hosts is null ? null : new RemoteChecker(hosts.Dispatcher);
        IBatchChecker checker = remote ?? (IBatchChecker)new EmbeddedChecker(EngineFactory.Create(args));
        using var outputs = new BatchOutputs(outFolder);
        var progress = new BatchProgress(Console.Error, total, TimeProvider.System, inPlace: !Console.IsErrorRedirected);
        try
        {
            await foreach (var (item, response) in checker.CheckAsync(items, CancellationToken.None))
            {
                outputs.Add(item, response);
                progress.Advance();
            }
        }
        catch (RpcException error) when (error.StatusCode == StatusCode.Unauthenticated)
        {
            throw new UsageException($"the host refused the call ({error.Status.Detail}); give its key with --api-key-file PATH or {ServerChannel.KeyVariable}");
        }
        catch (RpcException error) when (hosts is not null && (error.StatusCode == StatusCode.Unavailable || error.Status.DebugException is HttpRequestException))
        {
            // Unreachable (UNAVAILABLE), or TLS could not be set up (INTERNAL from the HTTP layer): often a private CA
            // that this machine does not trust.
            var cause = error.Status.DebugException?.Message is { } message ? $" ({message})" : "";
            throw new UsageException($"could not reach the host at {hosts.Description}: {error.Status.Detail}{cause}; for an https:// host with a private CA give --ca-cert PATH");
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

    private static RemoteHosts OpenHosts(ParsedArguments args)
    {
        if (args.Has("--plugins") || args.Has("--config"))
        {
            throw new UsageException("--plugins and --config configure the embedded engine; with --server the host's own configuration applies");
        }

        return RemoteHosts.Open(args);
    }

    private static BatchItem WithProfile(BatchItem item, string? profile, bool strictText)
    {
        if (profile is not null && item.Request is { } request) request.Profile = profile;
        // --strict refuses entries with unreadable text; without it each entry keeps its own strict_text.
        if (strictText && item.Request is { } strictRequest) strictRequest.StrictText = true;
        return item;
    }
}
