using System.Diagnostics;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.LoadGenerator.Target;
using Grpc.Core;
using Grpc.Net.Client;

namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>
/// Samples the server's memory every few seconds: resident set from /proc, and the managed heap through
/// Diagnostics/GetProcessMemory when the host serves it (started with --echo). Notices when the process goes.
/// </summary>
public sealed class MemorySampler(ProcessProbe probe, GrpcChannel channel, TimeSpan every)
{
    private readonly Diagnostics.DiagnosticsClient _diagnostics = new(channel);
    private bool _heapAvailable = true;

    /// <summary>The samples taken, in time order.</summary>
    public List<MemorySample> Samples { get; } = [];

    /// <summary>True once the server process was found gone.</summary>
    public bool ServerDied { get; private set; }

    /// <summary>Samples until <paramref name="stop"/> fires; fires <paramref name="died"/> when the server goes.</summary>
    public async Task RunAsync(Func<long> completedCalls, CancellationTokenSource died, CancellationToken stop)
    {
        var started = Stopwatch.GetTimestamp();
        while (!stop.IsCancellationRequested)
        {
            await SampleAsync(Stopwatch.GetElapsedTime(started).TotalSeconds, completedCalls());
            if (ServerDied)
            {
                await died.CancelAsync();
                return;
            }

            try
            {
                await Task.Delay(every, stop);
            }
            catch (OperationCanceledException)
            {
                break;
            }
        }

        await SampleAsync(Stopwatch.GetElapsedTime(started).TotalSeconds, completedCalls());
    }

    private async Task SampleAsync(double seconds, long completed)
    {
        if (probe.ResidentBytes() is not { } rss || !probe.IsAlive)
        {
            ServerDied = true;
            return;
        }

        var memory = await ManagedAsync();
        Samples.Add(new MemorySample(CallFigures.Round(seconds), rss, memory?.ManagedHeapBytes, memory?.GcCommittedBytes, memory?.Gen2Collections, completed));
    }

    private async Task<ProcessMemory?> ManagedAsync()
    {
        if (!_heapAvailable) return null;
        try
        {
            return await _diagnostics.GetProcessMemoryAsync(new ProcessMemoryRequest(), deadline: DateTime.UtcNow.AddSeconds(5));
        }
        catch (RpcException error) when (error.StatusCode == StatusCode.Unimplemented)
        {
            _heapAvailable = false;
            return null;
        }
        catch (RpcException)
        {
            // A host at its concurrency limit refuses this call like any other (RESOURCE_EXHAUSTED): the sample
            // keeps its resident set and goes without the managed heap rather than ending the soak.
            return null;
        }
    }
}

/// <summary>One memory sample of the server.</summary>
/// <param name="Seconds">Time since the soak started.</param>
/// <param name="ResidentBytes">VmRSS.</param>
/// <param name="ManagedHeapBytes">Managed heap after the last GC; null when the host does not serve diagnostics.</param>
/// <param name="GcCommittedBytes">Bytes committed by the GC; null likewise.</param>
/// <param name="Gen2Collections">Generation-2 collections so far; null likewise.</param>
/// <param name="CompletedCalls">Calls completed by then.</param>
public sealed record MemorySample(double Seconds, long ResidentBytes, long? ManagedHeapBytes, long? GcCommittedBytes, int? Gen2Collections, long CompletedCalls);
