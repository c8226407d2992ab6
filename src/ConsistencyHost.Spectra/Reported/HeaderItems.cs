using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>One item of a header's parenthesis: frequency, solvent, temperature, reference, the scale ("ppm") or a
/// note such as "rotamers 6:4" or "major Z isomer" (kept on the spectrum).</summary>
internal static class HeaderItems
{
    // Common practice: reference compounds named in headers carry no information the rules use.
    private static readonly string[] References = ["TMS", "Me4Si", "SiMe4", "internal TMS", "TMS internal"];

    private static readonly string[] RoomTemperature = ["rt", "r.t.", "room temperature", "RT"];

    // Common practice: the shift scale named inside the header, "(CDCl3, 300 MHz, δ, ppm)" (corpus rows si-154, si-162).
    private static readonly string[] ScaleWords = ["ppm", "δ", "δ (ppm)", "δ/ppm", "δ in ppm"];

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
        if (ScaleWords.Contains(item, StringComparer.Ordinal)) return;
        if (SignalNotes.IsNote(item))
        {
            header.Notes.Add(item);
            return;
        }
        sink.Add(offset, c.Fragment(offset, end), ReportedTextMessages.ExpectedHeaderItem);
    }

    /// <summary>A solvent, a mixture written "CDCl3/CD3OD", or a solvent with its reference "CDCl3/TMS".</summary>
    private static string? ReadSolvent(string item)
    {
        if (SolventNames.Normalise(item) is { } single) return single;
        var parts = item.Split('/', '+');
        if (parts.Length < 2) return null;
        var solvents = parts.Select(p => p.Trim()).Where(p => !References.Contains(p, StringComparer.OrdinalIgnoreCase)).ToArray();
        if (solvents.Length == 0) return null;
        var names = solvents.Select(SolventNames.Normalise).ToArray();
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
