using System.Globalization;

namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>Where and when a run happened: the figures only mean something next to the machine's load.</summary>
/// <param name="UtcTime">Start of the run, ISO 8601.</param>
/// <param name="ProcessorCount">Logical processors the runtime sees.</param>
/// <param name="LoadAverage1m">The 1-minute load average from /proc/loadavg; null when unreadable.</param>
public sealed record MachineNote(string UtcTime, int ProcessorCount, double? LoadAverage1m)
{
    /// <summary>The machine now.</summary>
    public static MachineNote Now() => new(
        DateTime.UtcNow.ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture), Environment.ProcessorCount, LoadAverage());

    /// <summary>The 1-minute load average; null when /proc/loadavg cannot be read.</summary>
    public static double? LoadAverage()
    {
        try
        {
            var first = File.ReadAllText("/proc/loadavg").Split(' ')[0];
            return double.Parse(first, CultureInfo.InvariantCulture);
        }
        catch (IOException)
        {
            return null;
        }
    }
}
