using System.Globalization;

namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>Field splitting shared by the tag readers: ", " or "," separators, parentheses and &lt;"…"&gt; quotes respected.</summary>
internal static class Fields
{
    public static List<string> Split(string text)
    {
        var fields = new List<string>();
        var depth = 0;
        var quoted = false;
        var start = 0;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (c == '"') quoted = !quoted;
            else if (!quoted && c == '(') depth++;
            else if (!quoted && c == ')') depth--;
            else if (!quoted && depth == 0 && c == ',')
            {
                fields.Add(text[start..i].Trim());
                start = i + 1;
            }
        }
        fields.Add(text[start..].Trim());
        return fields;
    }

    /// <summary>A label with its &lt;"…"&gt; quotes removed.</summary>
    public static string Unquote(string label) =>
        label.Length >= 4 && label.StartsWith("<\"", StringComparison.Ordinal) && label.EndsWith("\">", StringComparison.Ordinal)
            ? label[2..^2] : label;

    public static bool TryNumber(string text, out double value) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value);

    /// <summary>"4.1200", "-62.8000", or a range "7.2000-7.6000" in either order (low, high returned sorted).</summary>
    public static bool TryShift(string text, out double? shift, out double? low, out double? high)
    {
        shift = low = high = null;
        if (TryNumber(text, out var single))
        {
            shift = single;
            return true;
        }
        for (var i = 1; i < text.Length; i++)
        {
            if (text[i] != '-' || text[i - 1] is 'e' or 'E' or '-') continue;
            if (!TryNumber(text[..i], out var a) || !TryNumber(text[(i + 1)..], out var b)) continue;
            (low, high) = (Math.Min(a, b), Math.Max(a, b));
            return true;
        }
        return false;
    }
}
