using System.Globalization;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>Metadata a peak table needs: nucleus, frequency, solvent, temperature, factors and X units.</summary>
internal sealed record PeakContext(Nucleus Nucleus, double? FrequencyMHz, string? Solvent, double? TemperatureK,
    double XFactor, double YFactor, bool XInHz)
{
    public static PeakContext From(Dictionary<string, string> labels, List<JcampRecord> records, JcampProblemSink sink, int titleLine)
    {
        var nucleus = NucleusNames.Parse(Get(labels, ".OBSERVENUCLEUS"));
        if (nucleus == Nucleus.Unknown) Warn(records, ".OBSERVENUCLEUS", titleLine, sink, JcampMessages.ExpectedNucleus);
        var frequency = Number(Get(labels, ".OBSERVEFREQUENCY"));
        var solvent = Get(labels, ".SOLVENTNAME") is { Length: > 0 } s ? SolventNames.Normalise(s) ?? s : null;
        var units = Get(labels, "XUNITS")?.ToUpperInvariant();
        var inHz = units == "HZ";
        if (units is not (null or "PPM" or "HZ")) Warn(records, "XUNITS", titleLine, sink, JcampMessages.ExpectedKnownXUnits, ProblemSeverity.Error);
        if (inHz && frequency is null) Warn(records, "XUNITS", titleLine, sink, JcampMessages.ExpectedObserveFrequency, ProblemSeverity.Error);
        return new PeakContext(nucleus, frequency, solvent, Temperature(Get(labels, "TEMPERATURE")),
            Number(Get(labels, "XFACTOR")) ?? 1, Number(Get(labels, "YFACTOR")) ?? 1, inHz);
    }

    /// <summary>Applies XFACTOR/YFACTOR and converts Hz to ppm (δ = ν / MHz); widths end up in Hz.</summary>
    public Signal? ToSignal(RawPeak peak, JcampRecord table, JcampProblemSink sink)
    {
        var x = peak.X * XFactor;
        if (XInHz && FrequencyMHz is null) return null;
        var ppm = XInHz ? x / FrequencyMHz!.Value : x;
        double? width = peak.W is { } w ? w * XFactor : null;
        if (width is { } wx && !XInHz) width = FrequencyMHz is { } f ? wx * f : null;
        return new Signal
        {
            ShiftPpm = ppm,
            Integral = peak.Y is { } y ? y * YFactor : null,
            LineWidthHz = width,
            Multiplicity = peak.M?.ToLowerInvariant() ?? "",
            Assignments = peak.Assignment is { } a ? [a] : [],
        };
    }

    /// <summary>TEMPERATURE is °C in the core standard (from memory); values above 150 are taken as kelvin.</summary>
    private static double? Temperature(string? text) => Number(text) is { } t ? (t > 150 ? t : Math.Round(t + 273.15, 2)) : null;

    private static string? Get(Dictionary<string, string> labels, string key) => labels.TryGetValue(key, out var v) ? v.Trim() : null;

    public static double? Number(string? text)
    {
        if (text is null) return null;
        var first = text.Split([' ', '\t', '\n'], StringSplitOptions.RemoveEmptyEntries).FirstOrDefault();
        return double.TryParse(first, NumberStyles.Float, CultureInfo.InvariantCulture, out var v) ? v : null;
    }

    /// <summary>A problem on the record with <paramref name="label"/>, or on the block's title line when it is missing.</summary>
    private static void Warn(List<JcampRecord> records, string label, int titleLine, JcampProblemSink sink, string expected,
        ProblemSeverity severity = ProblemSeverity.Warning)
    {
        var record = records.LastOrDefault(r => r.Label == label);
        var line = record?.Value.Number ?? titleLine;
        sink.Add(line, 1, record is null ? "" : "##" + record.RawLabel + "=" + record.Value.Text, expected, severity);
    }
}
