using System.Globalization;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>How far apart two reported J values may be and still be the same coupling.</summary>
internal static class JTolerance
{
    /// <summary>
    /// The larger of the option's minimum and one unit of the last decimal either value was written with
    /// (7 Hz → 1 Hz; 7.1 Hz → 0.1 Hz), since each was rounded on its own.
    /// </summary>
    public static double Between(double a, double b, double minimum) =>
        Math.Max(minimum, Math.Max(Unit(a), Unit(b)));

    public static bool Same(double a, double b, double minimum) => Math.Abs(a - b) <= Between(a, b, minimum) + 1e-9;

    /// <summary><see cref="Same(double, double, double)"/> with each value's <see cref="Unit"/> already known.</summary>
    public static bool Same(double a, double unitA, double b, double unitB, double minimum) =>
        Math.Abs(a - b) <= Math.Max(minimum, Math.Max(unitA, unitB)) + 1e-9;

    /// <summary>One unit of the last decimal of <paramref name="value"/> written with at most three decimals.</summary>
    public static double Unit(double value)
    {
        // Formatted into a stack buffer: the same digits as ToString("0.###") without a string per call.
        Span<char> buffer = stackalloc char[64];
        ReadOnlySpan<char> text = value.TryFormat(buffer, out var written, "0.###", CultureInfo.InvariantCulture)
            ? buffer[..written]
            : value.ToString("0.###", CultureInfo.InvariantCulture);
        var dot = text.IndexOf('.');
        return dot < 0 ? 1.0 : Math.Pow(10, -(text.Length - dot - 1));
    }
}
