using System.Globalization;
using System.Text.Json;
using ConsistencyHost.StreamBench.Generation;
using ConsistencyHost.StreamBench.Streaming;

// Streaming-batch bench (docs/streaming.md). Entries are generated from real structures with invented peak
// lists: demo data for load only.
//   generate --entries N --out FILE.sdf [--smiles FILE]
//   grpc --target URL --entries N --server-pid PID [--out FILE.json] [--smiles FILE]
//   watch --pid PID --progress reports.jsonl --entries N [--server-pid PID] [--out FILE.json]
const string Usage = "usage: StreamBench generate --entries N --out FILE.sdf [--smiles FILE]\n"
    + "       StreamBench grpc --target URL --entries N --server-pid PID [--out FILE.json] [--smiles FILE]\n"
    + "       StreamBench watch --pid PID --progress reports.jsonl --entries N [--server-pid PID] [--out FILE.json]";
const string DefaultSmiles = "/usr/share/RDKit/Data/NCI/first_5K.smi";

if (args.Length == 0 || args.Length % 2 == 0)
{
    Console.Error.WriteLine(Usage);
    return 2;
}

var options = new Dictionary<string, string>(StringComparer.Ordinal);
for (var i = 1; i < args.Length; i += 2) options[args[i]] = args[i + 1];
string Need(string name) => options.TryGetValue(name, out var value) ? value : throw new ArgumentException($"{args[0]} needs {name}\n{Usage}");
int Count(string name) => int.TryParse(Need(name), NumberStyles.None, CultureInfo.InvariantCulture, out var n) && n > 0
    ? n : throw new ArgumentException($"{name} must be a positive whole number, not '{options[name]}'");

try
{
    var smiles = options.GetValueOrDefault("--smiles", DefaultSmiles);
    switch (args[0])
    {
        case "generate":
        {
            var entries = Count("--entries");
            var templates = DemoEntries.FromSmilesFile(smiles);
            new BatchFile(templates).WriteSdFile(Need("--out"), entries);
            Console.WriteLine($"wrote {entries} entries ({templates.Count} structures from {smiles}, cycled) to {options["--out"]}");
            return 0;
        }

        case "grpc":
        {
            var target = new Uri(Need("--target"));
            var (entries, pid) = (Count("--entries"), Count("--server-pid"));
            var run = new StreamRun(new BatchFile(DemoEntries.FromSmilesFile(smiles)), entries, pid);
            await Emit(await run.RunAsync(target, CancellationToken.None));
            return 0;
        }

        case "watch":
        {
            int? server = options.ContainsKey("--server-pid") ? Count("--server-pid") : null;
            await Emit(await new ProcessWatch(Count("--pid"), server, Need("--progress"), Count("--entries")).RunAsync());
            return 0;
        }

        default:
            Console.Error.WriteLine($"unknown mode '{args[0]}'\n{Usage}");
            return 2;
    }
}
catch (ArgumentException error)
{
    Console.Error.WriteLine(error.Message);
    return 2;
}

async Task Emit<T>(T result)
{
    var json = JsonSerializer.Serialize(result, new JsonSerializerOptions { WriteIndented = true, PropertyNamingPolicy = JsonNamingPolicy.CamelCase });
    if (options.TryGetValue("--out", out var path)) await File.WriteAllTextAsync(path, json + "\n");
    Console.WriteLine(json);
}
