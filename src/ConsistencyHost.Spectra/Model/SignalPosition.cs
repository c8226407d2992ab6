using System.Globalization;

namespace ConsistencyHost.Spectra.Model;

/// <summary>How a signal's position is written in a finding message: "δ 4.12" or "δ 7.31–7.24".</summary>
public static class SignalPosition
{
    /// <summary>The position with two decimals, a range from high to low as journals write it.</summary>
    public static string Describe(this Signal signal)
    {
        ArgumentNullException.ThrowIfNull(signal);
        return signal.ShiftPpm is { } shift
            ? "δ " + shift.ToString("0.00", CultureInfo.InvariantCulture)
            : string.Create(CultureInfo.InvariantCulture, $"δ {signal.RangeHighPpm:0.00}–{signal.RangeLowPpm:0.00}");
    }
}
