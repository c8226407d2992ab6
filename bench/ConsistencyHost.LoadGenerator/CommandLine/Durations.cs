using System.Globalization;

namespace ConsistencyHost.LoadGenerator.CommandLine;

/// <summary>Reads durations written as a number and a unit: "500ms", "20s", "10m", "1h".</summary>
public static class Durations
{
    private static readonly (string Suffix, double Seconds)[] Units = [("ms", 0.001), ("s", 1), ("m", 60), ("h", 3600)];

    /// <summary>Parses <paramref name="text"/>, given for <paramref name="option"/>.</summary>
    /// <exception cref="UsageException">Not a positive number followed by ms, s, m or h.</exception>
    public static TimeSpan Parse(string option, string text)
    {
        foreach (var (suffix, seconds) in Units)
        {
            if (!text.EndsWith(suffix, StringComparison.Ordinal)) continue;
            var number = text[..^suffix.Length];
            // "ms" also ends with "s": let the "ms" row handle it.
            if (suffix == "s" && number.EndsWith('m')) continue;
            if (double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && value > 0 && double.IsFinite(value))
            {
                return TimeSpan.FromSeconds(value * seconds);
            }
        }

        throw new UsageException($"{option}: '{text}' is not a duration; expected a positive number and a unit, e.g. 500ms, 30s, 10m, 1h");
    }
}
