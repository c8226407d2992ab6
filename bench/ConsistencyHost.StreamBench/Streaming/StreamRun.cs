using System.Diagnostics;
using System.Threading.Channels;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.StreamBench.Generation;
using Grpc.Core;
using Grpc.Net.Client;

namespace ConsistencyHost.StreamBench.Streaming;

/// <summary>
/// Streams N generated entries through one CheckEntries call (a sender and a reader, at most
/// <see cref="InFlight"/> entries between them, like the CLI's remote batch) and samples the host's memory at
/// every checkpoint: the peak working set (VmHWM) after 1k, 2k, 5k, 10k, … entries and at N.
/// </summary>
internal sealed class StreamRun(BatchFile batch, int entries, int serverPid)
{
    private const int InFlight = 32;

    public async Task<StreamResult> RunAsync(Uri target, CancellationToken cancellationToken)
    {
        using var channel = GrpcChannel.ForAddress(target);
        using var call = new EntryCheck.EntryCheckClient(channel).CheckEntries(cancellationToken: cancellationToken);
        var window = Channel.CreateBounded<int>(InFlight);
        var sending = SendAsync(call.RequestStream, window.Writer, cancellationToken);
        var clock = Stopwatch.StartNew();
        var checkpoints = new List<Checkpoint> { Sample(0, clock) };
        var received = 0;
        await foreach (var index in window.Reader.ReadAllAsync(cancellationToken))
        {
            if (!await call.ResponseStream.MoveNext(cancellationToken)) throw new InvalidOperationException($"the host ended the stream before entry {index + 1}");
            var expected = BatchFile.EntryId(index);
            if (call.ResponseStream.Current.EntryId != expected) throw new InvalidOperationException($"reply {index + 1} is for '{call.ResponseStream.Current.EntryId}', expected '{expected}'");
            received++;
            if (Checkpoints.IsAt(received, entries)) checkpoints.Add(Sample(received, clock));
        }

        await sending;
        return new StreamResult(entries, clock.Elapsed.TotalSeconds, checkpoints);
    }

    private async Task SendAsync(IClientStreamWriter<CheckEntryRequest> requests, ChannelWriter<int> window, CancellationToken cancellationToken)
    {
        try
        {
            for (var i = 0; i < entries; i++)
            {
                await window.WriteAsync(i, cancellationToken);
                await requests.WriteAsync(batch.Request(i), cancellationToken);
            }

            await requests.CompleteAsync();
            window.Complete();
        }
        catch (Exception error)
        {
            window.Complete(error);
        }
    }

    private Checkpoint Sample(int received, Stopwatch clock)
    {
        var memory = ProcMemory.Of(serverPid);
        return new Checkpoint(received, clock.Elapsed.TotalSeconds, memory.RssKiB, memory.PeakKiB);
    }
}
