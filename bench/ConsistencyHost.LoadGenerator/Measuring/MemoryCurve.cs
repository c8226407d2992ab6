using System.Globalization;
using System.Text;

namespace ConsistencyHost.LoadGenerator.Measuring;

/// <summary>First, last and largest value of a memory series, and its least-squares slope, MiB and MiB per minute.</summary>
/// <param name="FirstMiB">At the first sample.</param>
/// <param name="LastMiB">At the last sample.</param>
/// <param name="MaxMiB">Largest sample.</param>
/// <param name="SlopeMiBPerMinute">Slope over all samples.</param>
/// <param name="SlopeSecondHalfMiBPerMinute">Slope over the second half of the run, after start-up growth (JIT, pools) has settled.</param>
public sealed record MemoryCurve(double FirstMiB, double LastMiB, double MaxMiB, double SlopeMiBPerMinute, double SlopeSecondHalfMiBPerMinute)
{
    private const double MiB = 1024 * 1024;

    /// <summary>The curve of one series; null when no sample has a value.</summary>
    public static MemoryCurve? Of(IReadOnlyList<MemorySample> samples, Func<MemorySample, long?> value)
    {
        var points = samples.Where(s => value(s) is not null).Select(s => (X: s.Seconds / 60, Y: value(s)!.Value / MiB)).ToList();
        if (points.Count == 0) return null;
        var half = points[^1].X / 2;
        return new MemoryCurve(
            CallFigures.Round(points[0].Y), CallFigures.Round(points[^1].Y), CallFigures.Round(points.Max(p => p.Y)),
            CallFigures.Round(LinearTrend.Slope(points)), CallFigures.Round(LinearTrend.Slope([.. points.Where(p => p.X >= half)])));
    }

    /// <summary>The samples as CSV: seconds, rss_mib, managed_heap_mib, gc_committed_mib, gen2_collections, completed_calls.</summary>
    public static string Csv(IEnumerable<MemorySample> samples)
    {
        var csv = new StringBuilder("seconds,rss_mib,managed_heap_mib,gc_committed_mib,gen2_collections,completed_calls\n");
        foreach (var s in samples)
        {
            csv.Append(CultureInfo.InvariantCulture,
                $"{s.Seconds},{Mib(s.ResidentBytes)},{Mib(s.ManagedHeapBytes)},{Mib(s.GcCommittedBytes)},{s.Gen2Collections},{s.CompletedCalls}\n");
        }

        return csv.ToString();
    }

    private static string Mib(long? bytes) => bytes is { } b ? (b / MiB).ToString("F2", CultureInfo.InvariantCulture) : "";
}
