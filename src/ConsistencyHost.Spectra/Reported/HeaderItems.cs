using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>One item of a header's parenthesis: frequency, solvent, temperature or reference.</summary>
internal static class HeaderItems
{
    // Common practice: reference compounds named in headers carry no information the rules use.
    private static readonly string[] References = ["TMS", "Me4Si", "SiMe4", "internal TMS", "TMS internal"];

    private static readonly string[] RoomTemperature = ["rt", "r.t.", "room temperature", "RT"];

    public static void Apply(TextCursor c, int start, int end, SpectrumHeader header, ProblemSink sink)
    {
        var raw = c.Text[start..end];
        var item = raw.Trim();
        var offset = start + (raw.Length - raw.TrimStart().Length);
        if (TryMeasure(item, header)) return;
        if (ReadSolvent(item) is { } solvent)
        {
            header.Solvent = solvent;
            return;
        }
        if (References.Contains(item, StringComparer.OrdinalIgnoreCase)) return;
        if (RoomTemperature.Contains(item, StringComparer.OrdinalIgnoreCase)) return;
        sink.Add(offset, c.Fragment(offset, end), ReportedTextMessages.ExpectedHeaderItem);
    }

    /// <summary>A solvent or a mixture written "CDCl3/CD3OD".</summary>
    private static string? ReadSolvent(string item)
    {
        if (SolventNames.Normalise(item) is { } single) return single;
        var parts = item.Split('/', '+');
        if (parts.Length < 2) return null;
        var names = parts.Select(p => SolventNames.Normalise(p.Trim())).ToArray();
        return names.All(n => n is not null) ? string.Join('/', names) : null;
    }

    /// <summary>"400 MHz", "298 K", "25 °C", "25 ºC", "25 oC".</summary>
    private static bool TryMeasure(string item, SpectrumHeader header)
    {
        var cursor = new TextCursor(item);
        if (!cursor.TryNumber(false, out var value, out _)) return false;
        cursor.SkipSpaces();
        var unit = item[cursor.Pos..].Trim();
        switch (unit)
        {
            case "MHz" or "MHZ" or "mhz":
                header.FrequencyMHz = value;
                return true;
            case "K":
                header.TemperatureK = value;
                return true;
            case "°C" or "ºC" or "° C" or "oC" or "℃" or "C":
                header.TemperatureK = Math.Round(value + 273.15, 2);
                return true;
            default:
                return false;
        }
    }
}
