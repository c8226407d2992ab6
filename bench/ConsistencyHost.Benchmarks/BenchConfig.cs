using BenchmarkDotNet.Columns;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Diagnosers;
using BenchmarkDotNet.Exporters.Json;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;

namespace ConsistencyHost.Benchmarks;

/// <summary>How long each benchmark runs.</summary>
public enum BenchMode
{
    /// <summary>CI-sized: a few seconds per benchmark.</summary>
    Short,
    /// <summary>More iterations for a steadier median.</summary>
    Full,
}

/// <summary>The one configuration every benchmark runs with.</summary>
public static class BenchConfig
{
    /// <summary>In-process runs, medians, allocated bytes, and a JSON export the report script reads.</summary>
    /// <remarks>
    /// In-process: BenchmarkDotNet's default toolchain generates and builds a project per benchmark class,
    /// which on a shared 2-core machine costs more than the measurements themselves.
    /// </remarks>
    public static IConfig For(BenchMode mode)
    {
        var job = mode == BenchMode.Short
            ? Job.Default.WithLaunchCount(1).WithWarmupCount(2).WithIterationCount(7).WithIterationTime(Perfolizer.Horology.TimeInterval.FromMilliseconds(250))
            : Job.Default.WithLaunchCount(1).WithWarmupCount(5).WithIterationCount(25);
        return ManualConfig.CreateEmpty()
            .AddJob(job.WithToolchain(InProcessEmitToolchain.Instance).WithId(mode.ToString()))
            .AddColumnProvider(DefaultColumnProviders.Instance)
            .AddColumn(StatisticColumn.Median)
            .AddDiagnoser(MemoryDiagnoser.Default)
            .AddExporter(JsonExporter.Full)
            .AddLogger(BenchmarkDotNet.Loggers.ConsoleLogger.Default)
            .WithArtifactsPath(Path.Combine(RepoPaths.Root, "bench", "results", "dotnet"))
            .WithOptions(ConfigOptions.JoinSummary);
    }
}
