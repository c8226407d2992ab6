using System.Globalization;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Turns per-configuration counts into expected signal-count ranges with reasons (nmr-methods.md §2.7).</summary>
internal static class SignalCountRanges
{
    public static SignalCountRange Hydrogen(List<ConfigurationStats> stats, int unspecified, bool rigid, bool exact, (ConfigurationStats Stats, int Bonds)? slow)
    {
        var reasons = new List<string>();
        var max = stats.Max(s => s.HydrogenClassCount);
        var min = stats.Min(s => s.HydrogenClassCount - s.ExchangeableClasses - s.DiastereotopicPairs - s.DiastereotopicHydrogenGroups);
        var worst = stats.MaxBy(s => s.HydrogenClassCount)!;
        if (worst.ExchangeableClasses > 0)
        {
            reasons.Add(F($"{worst.ExchangeableClasses} exchangeable H class(es) (O–H, N–H, S–H) may be absent, broadened or merged with the water signal (always absent in D2O, CD3OD)"));
        }

        if (worst.DiastereotopicPairs > 0)
        {
            reasons.Add(F($"{worst.DiastereotopicPairs} diastereotopic CH2/=CH2 proton pair(s) may coincide"));
        }

        if (worst.DiastereotopicHydrogenGroups > 0)
        {
            reasons.Add(F($"{worst.DiastereotopicHydrogenGroups} diastereotopic group(s) (e.g. isopropyl methyls) may coincide"));
        }

        AddConfigurationReason(reasons, stats, rigid ? 0 : unspecified, s => s.HydrogenClassCount);
        AddExactnessReason(reasons, exact);
        max = AddSlowRotation(reasons, slow, max, s => s.HydrogenClassCount);
        return new SignalCountRange(Math.Clamp(min, 0, max), max, reasons);
    }

    public static SignalCountRange Carbon(List<ConfigurationStats> stats, int unspecified, bool rigid, bool exact, (ConfigurationStats Stats, int Bonds)? slow)
    {
        var reasons = new List<string>();
        var max = stats.Max(s => s.CarbonClassCount);
        var min = stats.Min(s => s.CarbonClassCount - s.DiastereotopicCarbons);
        var worst = stats.MaxBy(s => s.CarbonClassCount)!;
        if (worst.DiastereotopicCarbons > 0)
        {
            reasons.Add(F($"{worst.DiastereotopicCarbons} diastereotopic carbon(s) may coincide with their constitutional partner"));
        }

        AddConfigurationReason(reasons, stats, rigid ? 0 : unspecified, s => s.CarbonClassCount);
        AddExactnessReason(reasons, exact);
        max = AddSlowRotation(reasons, slow, max, s => s.CarbonClassCount);
        return new SignalCountRange(Math.Min(min, max), max, reasons);
    }

    private static void AddConfigurationReason(List<string> reasons, List<ConfigurationStats> stats, int unspecified, Func<ConfigurationStats, int> count)
    {
        var lo = stats.Min(count);
        var hi = stats.Max(count);
        if (unspecified > StereoEnumeration.MaxEnumerated)
        {
            reasons.Add(F($"{unspecified} stereo elements unspecified; range estimated from {stats.Count} sample configurations"));
        }
        else if (lo != hi)
        {
            reasons.Add(F($"relative configuration of {unspecified} stereo element(s) unspecified: {lo} to {hi} classes over {stats.Count} configurations"));
        }
    }

    /// <summary>Slow amide rotation can only add signals (rotamers): it raises Max, never Min (§2.6, §2.7).</summary>
    private static int AddSlowRotation(List<string> reasons, (ConfigurationStats Stats, int Bonds)? slow, int max, Func<ConfigurationStats, int> count)
    {
        if (slow is not { } s || count(s.Stats) <= max)
        {
            return max;
        }

        reasons.Add(F($"{s.Bonds} amide/carbamate C–N bond(s) rotate slowly at room temperature: rotamer or cis/trans N-substituent signals may add up to {count(s.Stats) - max}"));
        return count(s.Stats);
    }

    private static void AddExactnessReason(List<string> reasons, bool exact)
    {
        if (!exact)
        {
            reasons.Add("symmetry search budget exceeded: some equivalent atoms may be listed as separate classes");
        }
    }

    private static string F(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
