using System.Globalization;
using System.Net;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>Invariant number formatting and escaping for the hand-written SVG and HTML.</summary>
internal static class SvgText
{
    public static string N(double value) => value.ToString("0.##", CultureInfo.InvariantCulture);

    public static string Ppm(double value) => value.ToString("0.00", CultureInfo.InvariantCulture);

    public static string E(string? text) => WebUtility.HtmlEncode(text ?? "");
}
