using System.Text.Json;
using ConsistencyHost.LoadGenerator.CommandLine;
using ConsistencyHost.LoadGenerator.Modes;

namespace ConsistencyHost.LoadGenerator;

/// <summary>
/// Drives a running ConsistencyHost over gRPC. Prints the mode's JSON summary on stdout (and to --out);
/// exits 0 when every call succeeded, 1 on any failed or lost call or a server that died, 2 on a bad command line.
/// </summary>
public static class Program
{
    private const string Usage =
        "usage:\n" +
        "  loadgen compare --target URL [--concurrency 8] [--duration 30s] [--phases 6] [--warmup 3s] [--server-pid PID] [--out FILE]\n" +
        "  loadgen soak --target URL --rate N/s --server-pid PID [--duration 10m] [--sample-every 5s] [--warmup 5s] [--max-in-flight 1000] [--out FILE] [--csv FILE]\n" +
        "  loadgen replicas --targets URL1,URL2,URL3 [--concurrency 8] [--entries 2000] [--server-pids P1,P2,P3] [--out FILE]\n" +
        "every mode: [--call-timeout 10s]\n";

    private static readonly JsonSerializerOptions Json = new() { PropertyNamingPolicy = JsonNamingPolicy.CamelCase, WriteIndented = true };

    /// <summary>Entry point.</summary>
    public static async Task<int> Main(string[] args)
    {
        try
        {
            if (args.Length == 0) throw new UsageException("no mode given; expected compare, soak or replicas");
            var outcome = await RunAsync(args[0], args[1..]);
            var text = JsonSerializer.Serialize(outcome.Summary, outcome.Summary.GetType(), Json);
            Console.WriteLine(text);
            if (Arguments.Parse(args[1..], Known(args[0])).Value("--out") is { } path) await File.WriteAllTextAsync(path, text + "\n");
            return outcome.Ok ? 0 : 1;
        }
        catch (UsageException error)
        {
            await Console.Error.WriteLineAsync("error: " + error.Message + "\n" + Usage);
            return 2;
        }
    }

    private static Task<ModeOutcome> RunAsync(string mode, string[] rest)
    {
        var args = Arguments.Parse(rest, Known(mode));
        return mode switch
        {
            "compare" => CompareMode.RunAsync(args),
            "soak" => SoakMode.RunAsync(args),
            _ => ReplicasMode.RunAsync(args),
        };
    }

    private static string[] Known(string mode) => mode switch
    {
        "compare" => CompareMode.Options,
        "soak" => SoakMode.Options,
        "replicas" => ReplicasMode.Options,
        _ => throw new UsageException($"unknown mode '{mode}'; expected compare, soak or replicas"),
    };
}
