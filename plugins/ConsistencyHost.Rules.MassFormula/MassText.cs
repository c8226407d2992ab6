using System.Globalization;

namespace ConsistencyHost.Rules.MassFormula;

/// <summary>How the rule writes numbers into messages and evidence: invariant culture, fixed decimals.</summary>
internal static class MassText
{
    /// <summary>m/z to 6 decimals (µu), the precision of the worked examples in nmr-data-standards.md §7.3.</summary>
    public static string Mz(double value) => value.ToString("F6", CultureInfo.InvariantCulture);

    /// <summary>An m/z as the author wrote it, with their number of decimals.</summary>
    public static string Reported(double value, int decimals) =>
        value.ToString("F" + Math.Clamp(decimals, 0, 9).ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>A mass difference in mDa, two decimals (10 µu).</summary>
    public static string MilliDaltons(double differenceU) => (differenceU * 1000).ToString("F2", CultureInfo.InvariantCulture);

    /// <summary>A relative difference in ppm, two decimals.</summary>
    public static string Ppm(double value) => value.ToString("F2", CultureInfo.InvariantCulture);

    /// <summary>Any other number, shortest round-trip form.</summary>
    public static string Plain(double value) => value.ToString(CultureInfo.InvariantCulture);
}
