using System.Globalization;

namespace ConsistencyHost.LoadGenerator.Target;

/// <summary>
/// Reads a server process's resident memory and CPU time from /proc (Linux), to watch a host from outside
/// without tooling in it. A missing /proc entry means the process has gone.
/// </summary>
/// <param name="Pid">The process id.</param>
public sealed record ProcessProbe(int Pid)
{
    // USER_HZ, the unit of utime/stime in /proc/PID/stat: 100 on every mainstream Linux architecture
    // (common practice; proc(5) says to read it with sysconf(_SC_CLK_TCK)).
    private const double ClockTicksPerSecond = 100;

    /// <summary>Whether the process still exists (and is not a zombie).</summary>
    public bool IsAlive => ReadStatus("State:") is { } state && !state.StartsWith('Z');

    /// <summary>Resident set size, bytes (VmRSS of /proc/PID/status); null when the process has gone.</summary>
    public long? ResidentBytes() =>
        ReadStatus("VmRSS:") is { } value ? long.Parse(value.Split(' ', StringSplitOptions.RemoveEmptyEntries)[0], CultureInfo.InvariantCulture) * 1024 : null;

    /// <summary>User plus system CPU time used so far, seconds; null when the process has gone.</summary>
    public double? CpuSeconds()
    {
        string text;
        try
        {
            text = File.ReadAllText($"/proc/{Pid}/stat");
        }
        catch (IOException)
        {
            return null;
        }

        // Fields after the parenthesised command name (which may hold spaces): utime and stime are fields 14 and 15.
        var fields = text[(text.LastIndexOf(')') + 2)..].Split(' ');
        return (double.Parse(fields[11], CultureInfo.InvariantCulture) + double.Parse(fields[12], CultureInfo.InvariantCulture)) / ClockTicksPerSecond;
    }

    private string StatusPath => $"/proc/{Pid}/status";

    private string? ReadStatus(string key)
    {
        try
        {
            return File.ReadLines(StatusPath).FirstOrDefault(l => l.StartsWith(key, StringComparison.Ordinal))?[key.Length..].Trim();
        }
        catch (IOException)
        {
            return null;
        }
    }
}
