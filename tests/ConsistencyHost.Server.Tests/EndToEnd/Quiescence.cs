namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// Tells a write that completes from one that is held: a write is held when it has not completed while the
/// host's counters stayed unchanged for a whole quiet period. The period only detects the stall; nothing is
/// asserted about how fast anything ran.
/// </summary>
internal static class Quiescence
{
    private static readonly TimeSpan Poll = TimeSpan.FromMilliseconds(50);
    private const int QuietPolls = 40;
    private const int MaxPolls = 2400;

    /// <summary>True when <paramref name="write"/> completed; false when it is held while <paramref name="progress"/> stands still.</summary>
    public static async Task<bool> CompletesOrStalls(Task write, Func<(long, long)> progress, Func<bool> heldState)
    {
        var last = progress();
        var quiet = 0;
        for (var polls = 0; polls < MaxPolls; polls++)
        {
            if (write.IsCompleted)
            {
                await write;
                return true;
            }

            await Task.WhenAny(write, Task.Delay(Poll));
            var now = progress();
            quiet = now == last && heldState() ? quiet + 1 : 0;
            last = now;
            if (quiet >= QuietPolls && !write.IsCompleted) return false;
        }

        throw new TimeoutException($"a write neither completed nor stalled within {MaxPolls} polls");
    }
}
