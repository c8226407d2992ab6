namespace ConsistencyHost.StreamBench.Streaming;

/// <summary>
/// A process's resident set from /proc/PID/status (Linux, proc(5)): VmRSS now and VmHWM, the peak since the
/// process started, both in KiB.
/// </summary>
internal readonly record struct ProcMemory(long RssKiB, long PeakKiB)
{
    public static ProcMemory Of(int pid)
    {
        long rss = -1, peak = -1;
        foreach (var line in File.ReadLines($"/proc/{pid}/status"))
        {
            if (line.StartsWith("VmRSS:", StringComparison.Ordinal)) rss = KiB(line);
            else if (line.StartsWith("VmHWM:", StringComparison.Ordinal)) peak = KiB(line);
        }

        return rss >= 0 && peak >= 0 ? new ProcMemory(rss, peak) : throw new InvalidDataException($"/proc/{pid}/status has no VmRSS/VmHWM lines");
    }

    private static long KiB(string line) => long.Parse(line.Split(':')[1].Trim().Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture);
}
