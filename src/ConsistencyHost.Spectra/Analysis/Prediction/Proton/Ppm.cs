using System.Globalization;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>Formats shift values for reasons, invariant culture, two decimals.</summary>
internal static class Ppm
{
    /// <summary>"1.37".</summary>
    public static string Plain(double ppm) => ppm.ToString("0.00", CultureInfo.InvariantCulture);

    /// <summary>"+2.80" or "−0.22".</summary>
    public static string Signed(double ppm) => ppm >= 0
        ? "+" + ppm.ToString("0.00", CultureInfo.InvariantCulture)
        : "−" + (-ppm).ToString("0.00", CultureInfo.InvariantCulture);
}
