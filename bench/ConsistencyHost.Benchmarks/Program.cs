using BenchmarkDotNet.Running;
using ConsistencyHost.Benchmarks;

// `--short` (CI-sized) or `--full` first, then BenchmarkDotNet's own arguments (e.g. --filter '*Text*').
var (mode, rest) = args.Length > 0 && args[0] is "--short" or "--full"
    ? (args[0], args[1..])
    : ("--short", args);
var config = BenchConfig.For(mode == "--full" ? BenchMode.Full : BenchMode.Short);
var summaries = BenchmarkSwitcher.FromAssembly(typeof(BenchConfig).Assembly).Run(rest, config);
return summaries.Any(s => s.HasCriticalValidationErrors || s.Reports.Any(r => !r.Success)) ? 1 : 0;
