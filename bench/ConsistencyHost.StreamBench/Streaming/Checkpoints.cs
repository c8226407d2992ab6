namespace ConsistencyHost.StreamBench.Streaming;

/// <summary>Where memory is sampled: 1k, 2k, 5k, 10k, 20k, 50k, 100k, … entries, and the last entry.</summary>
internal static class Checkpoints
{
    public static bool IsAt(int received, int total)
    {
        if (received == total) return true;
        for (var decade = 1000; decade <= received; decade *= 10)
        {
            if (received == decade || received == 2 * decade || received == 5 * decade) return true;
        }

        return false;
    }
}

/// <summary>The host's memory after <paramref name="Entries"/> replies (KiB; VmHWM is the peak so far).</summary>
internal sealed record Checkpoint(int Entries, double Seconds, long RssKiB, long PeakKiB);

/// <summary>One streaming run: entries, wall time and the checkpoints.</summary>
internal sealed record StreamResult(int Entries, double Seconds, IReadOnlyList<Checkpoint> Checkpoints);
