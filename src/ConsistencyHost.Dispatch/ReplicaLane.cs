using ConsistencyHost.Contract.V1;
using Grpc.Core;
using Grpc.Net.Client;

namespace ConsistencyHost.Dispatch;

/// <summary>
/// One replica for the length of a dispatch: streams entries to it while it is up; when a stream fails, hands
/// the unanswered entries back for resubmission, marks the replica down, waits a back-off and probes it with a
/// <c>ListRules</c> call before streaming again; gives it up after <see cref="DispatchOptions.MaxReplicaFailures"/>
/// failures in a row.
/// </summary>
/// <remarks>
/// Down-marking with probes after an exponential back-off is the circuit-breaker pattern (Nygard, <i>Release It!</i>,
/// 2007); the probe uses the contract's cheapest call so that a replica counts as up only when it answers gRPC.
/// </remarks>
internal sealed class ReplicaLane(GrpcChannel channel, ILaneHub hub)
{
    private readonly EntryCheck.EntryCheckClient _client = new(channel);
    private int _sent;
    private int _reported;
    private int _failures;
    private bool _givenUp;

    public string Target => channel.Target;

    public ReplicaTally Tally() => new(Target, Volatile.Read(ref _sent), Volatile.Read(ref _reported), Volatile.Read(ref _failures), Volatile.Read(ref _givenUp));

    /// <summary>Runs until <paramref name="finished"/> (gracefully) or <paramref name="abort"/>, or until the replica is given up.</summary>
    public async Task RunAsync(CancellationToken finished, CancellationToken abort)
    {
        var inARow = 0;
        while (!finished.IsCancellationRequested && !abort.IsCancellationRequested)
        {
            if (inARow > 0 && !await WaitAndProbeAsync(inARow, finished, abort))
            {
                if (GiveUpAfter(++inARow, new RpcException(new Status(StatusCode.Unavailable, $"replica {Target} did not answer the probe")))) return;
                continue;
            }

            var stream = new ReplicaStream(_client, hub);
            try
            {
                await stream.RunAsync(finished, abort);
                return;
            }
            catch (RpcException error) when (!abort.IsCancellationRequested && IsRefusal(error.StatusCode))
            {
                // The host refused the caller (a missing or wrong key): every replica of one deployment would,
                // and sending again cannot help. The dispatch ends with the host's own reason.
                hub.Fail(error);
                return;
            }
            catch (Exception error) when (!abort.IsCancellationRequested)
            {
                inARow = stream.Reported > 0 ? 1 : inARow + 1;
                hub.Resubmit(stream.Unanswered.TakeAll(), error);
                if (GiveUpAfter(inARow, error)) return;
            }
            finally
            {
                Interlocked.Add(ref _sent, stream.Sent);
                Interlocked.Add(ref _reported, stream.Reported);
            }
        }
    }

    private static bool IsRefusal(StatusCode status) => status is StatusCode.Unauthenticated or StatusCode.PermissionDenied;

    private bool GiveUpAfter(int inARow, Exception cause)
    {
        Interlocked.Increment(ref _failures);
        if (inARow < hub.Options.MaxReplicaFailures) return false;
        Volatile.Write(ref _givenUp, true);
        hub.ReplicaGivenUp(Target, cause);
        return true;
    }

    private async Task<bool> WaitAndProbeAsync(int inARow, CancellationToken finished, CancellationToken abort)
    {
        using var either = CancellationTokenSource.CreateLinkedTokenSource(finished, abort);
        try
        {
            await Task.Delay(hub.Options.Backoff(inARow), hub.Options.TimeProvider, either.Token);
            var deadline = hub.Options.TimeProvider.GetUtcNow().UtcDateTime + hub.Options.ProbeTimeout;
            await _client.ListRulesAsync(new ListRulesRequest(), deadline: deadline, cancellationToken: either.Token);
            return true;
        }
        catch (OperationCanceledException) when (either.IsCancellationRequested)
        {
            return true; // the dispatch is ending; the loop condition stops the lane
        }
        catch (RpcException)
        {
            return either.IsCancellationRequested; // down, unless the failure was the dispatch ending
        }
    }
}
