// Times plugin vetting and loading with a Stopwatch, median over N runs:
//   dotnet run -c Release --project bench/ConsistencyHost.VettingBench -- [runs]
// Build the built-in and sample plugins first (dotnet build ConsistencyHost.sln). Numbers depend on the
// machine and its load; they are for orientation, never asserted.
using System.Diagnostics;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Vetting;

var runs = args.Length > 0 ? int.Parse(args[0], System.Globalization.CultureInfo.InvariantCulture) : 20;
var root = FindRoot();
var compiled = Path.Combine(root, "artifacts", "plugins", "ConsistencyHost.Rules.SpectrumMetadata");
var sample = Path.Combine(root, "samples", "plugins", "Lindqvist.CouplingsListed");
var work = Directory.CreateTempSubdirectory("ch-bench-").FullName;

Report("vet compiled plugin (metadata + IL scan)", runs, () => CompiledPluginVetter.Default.Vet(Path.Combine(compiled, "ConsistencyHost.Rules.SpectrumMetadata.dll")));
Report("vet + load compiled plugin (discovery)", runs, () => PluginDiscovery.Discover(CopyCompiled(compiled, work)));

var sourceFolder = CopySource(sample, work);
var first = Stopwatch.StartNew();
new SourcePluginCompiler(Path.Combine(work, "cache-first")).Compile(sourceFolder);
Console.WriteLine($"compile + vet source plugin, first in process (Roslyn JIT): {first.Elapsed.TotalMilliseconds:F1} ms");
Report("compile + vet source plugin, cold cache", runs, () => new SourcePluginCompiler(Path.Combine(work, "cache-" + Guid.NewGuid().ToString("N"))).Compile(sourceFolder));
var warm = new SourcePluginCompiler(Path.Combine(work, "cache-warm"));
warm.Compile(sourceFolder);
Report("compile + vet source plugin, cached", runs, () => warm.Compile(sourceFolder));
Directory.Delete(work, recursive: true);

static void Report(string what, int runs, Action action)
{
    action();
    var times = new List<double>(runs);
    for (var i = 0; i < runs; i++)
    {
        var clock = Stopwatch.StartNew();
        action();
        times.Add(clock.Elapsed.TotalMilliseconds);
    }

    times.Sort();
    Console.WriteLine($"{what}: median {times[runs / 2]:F2} ms, min {times[0]:F2}, max {times[^1]:F2} (n={runs})");
}

static string CopyCompiled(string plugin, string work)
{
    var folder = Path.Combine(work, "compiled-" + Guid.NewGuid().ToString("N"));
    var target = Directory.CreateDirectory(Path.Combine(folder, Path.GetFileName(plugin))).FullName;
    foreach (var file in Directory.EnumerateFiles(plugin)) File.Copy(file, Path.Combine(target, Path.GetFileName(file)));
    return folder;
}

static string CopySource(string plugin, string work)
{
    var target = Directory.CreateDirectory(Path.Combine(work, "source", Path.GetFileName(plugin))).FullName;
    foreach (var file in SourceFiles.Read(plugin)) File.WriteAllText(Path.Combine(target, file.RelativePath), file.Text);
    return target;
}

static string FindRoot()
{
    var directory = new DirectoryInfo(AppContext.BaseDirectory);
    while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "ConsistencyHost.sln"))) directory = directory.Parent;
    return directory?.FullName ?? throw new InvalidOperationException("ConsistencyHost.sln not found");
}
