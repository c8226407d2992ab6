using System.Runtime.CompilerServices;
using System.Threading.Channels;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.V1;
using Grpc.Core;
using Grpc.Net.Client;

namespace ConsistencyHost.Cli.Batch;

/// <summary>
/// Checks entries on a running host through the bidirectional CheckEntries call. A sender writes requests while
/// this reader takes replies in order; at most <see cref="InFlight"/> entries are between the two, so a large
/// batch never sits in memory. Unreadable items are not sent; their input-error reply is made here, in place.
/// </summary>
internal sealed class RemoteChecker(GrpcChannel channel) : IBatchChecker
{
    private const int InFlight = 32;

    public async IAsyncEnumerable<(BatchItem Item, CheckEntryResponse Response)> CheckAsync(
        IEnumerable<BatchItem> items, [EnumeratorCancellation] CancellationToken cancellationToken)
    {
        using var call = new EntryCheck.EntryCheckClient(channel).CheckEntries(cancellationToken: cancellationToken);
        var pending = Channel.CreateBounded<BatchItem>(InFlight);
        var sending = SendAsync(items, call.RequestStream, pending.Writer, cancellationToken);
        await foreach (var item in pending.Reader.ReadAllAsync(cancellationToken))
        {
            if (item.Request is null)
            {
                yield return (item, ReportMapper.ToInputErrorResponse(item.EntryId, item.Problem!.Field, item.Problem.Reason));
                continue;
            }

            if (!await call.ResponseStream.MoveNext(cancellationToken))
            {
                throw new RpcException(new Status(StatusCode.Unavailable, $"the host ended the stream before answering entry '{item.EntryId}'"));
            }

            yield return (item, call.ResponseStream.Current);
        }

        await sending;
    }

    private static async Task SendAsync(
        IEnumerable<BatchItem> items, IClientStreamWriter<CheckEntryRequest> requests, ChannelWriter<BatchItem> pending, CancellationToken cancellationToken)
    {
        try
        {
            foreach (var item in items)
            {
                await pending.WriteAsync(item, cancellationToken);
                if (item.Request is not null) await requests.WriteAsync(item.Request, cancellationToken);
            }

            await requests.CompleteAsync();
            pending.Complete();
        }
        catch (Exception error)
        {
            pending.Complete(error);
        }
    }
}
