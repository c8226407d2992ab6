using System.Text.Json;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Cli.Output;

/// <summary>
/// The JSON shape of <c>peaks --format json</c>: per spectrum nucleus, frequencyMHz, solvent, temperatureK and
/// signals; per signal shiftPpm or rangeLowPpm/rangeHighPpm, multiplicity (canonical spelling; the text as
/// written in multiplicityReported), couplingsHz, protonCount (1H) or carbonCount (13C, null when not stated),
/// notes and assignments. Unknown values are null.
/// </summary>
internal static class PeaksJson
{
    public static void WriteSpectrum(Utf8JsonWriter json, Spectrum spectrum)
    {
        json.WriteStartObject();
        json.WriteString("nucleus", spectrum.Nucleus.ToLabel());
        WriteNumber(json, "frequencyMHz", spectrum.FrequencyMHz);
        json.WriteString("solvent", spectrum.Solvent);
        WriteNumber(json, "temperatureK", spectrum.TemperatureK);
        json.WriteStartArray("signals");
        foreach (var signal in spectrum.Signals) WriteSignal(json, signal, spectrum.Nucleus);
        json.WriteEndArray();
        json.WriteEndObject();
    }

    public static void WriteHrms(Utf8JsonWriter json, HrmsClaim claim)
    {
        json.WriteStartObject();
        json.WriteString("ionisation", claim.Ionisation);
        json.WriteString("ion", claim.IonLabel);
        json.WriteString("ionFormula", claim.IonFormula);
        json.WriteNumber("calculatedMz", claim.CalculatedMz);
        WriteNumber(json, "foundMz", claim.FoundMz);
        json.WriteEndObject();
    }

    private static void WriteSignal(Utf8JsonWriter json, Signal signal, Nucleus nucleus)
    {
        json.WriteStartObject();
        if (signal.ShiftPpm is { } shift)
        {
            json.WriteNumber("shiftPpm", shift);
        }
        else
        {
            WriteNumber(json, "rangeLowPpm", signal.RangeLowPpm);
            WriteNumber(json, "rangeHighPpm", signal.RangeHighPpm);
        }

        var pattern = signal.MultiplicityPattern;
        json.WriteString("multiplicity", pattern.IsRecognised ? pattern.Canonical : signal.Multiplicity);
        json.WriteString("multiplicityReported", signal.Multiplicity);
        json.WriteStartArray("couplingsHz");
        foreach (var coupling in signal.Couplings) json.WriteNumberValue(coupling.Hz);
        json.WriteEndArray();
        if (nucleus == Nucleus.C13)
        {
            WriteNumber(json, "carbonCount", signal.CarbonCount);
        }
        else
        {
            WriteNumber(json, "protonCount", signal.ProtonCount);
        }

        WriteNumber(json, "integral", signal.Integral);
        WriteStrings(json, "notes", signal.Notes);
        WriteStrings(json, "assignments", signal.Assignments);
        json.WriteEndObject();
    }

    private static void WriteStrings(Utf8JsonWriter json, string name, IReadOnlyList<string> values)
    {
        json.WriteStartArray(name);
        foreach (var value in values) json.WriteStringValue(value);
        json.WriteEndArray();
    }

    private static void WriteNumber(Utf8JsonWriter json, string name, double? value)
    {
        if (value is { } number) json.WriteNumber(name, number);
        else json.WriteNull(name);
    }

    private static void WriteNumber(Utf8JsonWriter json, string name, int? value)
    {
        if (value is { } number) json.WriteNumber(name, number);
        else json.WriteNull(name);
    }
}
