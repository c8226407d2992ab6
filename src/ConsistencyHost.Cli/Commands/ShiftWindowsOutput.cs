using System.Globalization;
using System.Text;
using System.Text.Json;
using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Analysis.Prediction;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// The predicted shift window of each 1H and 13C class for <c>environments</c> (docs/spectrum-model.md): text
/// lines and the additive JSON arrays <c>hydrogenShiftWindows</c> and <c>carbonShiftWindows</c>.
/// </summary>
internal static class ShiftWindowsOutput
{
    public static ClassShifts Predict(Molecule molecule, string? solvent) =>
        ClassShifts.Of(PredictionContext.Of(molecule), NmrEquivalence.Of(molecule), solvent);

    public static string Text(ClassShifts shifts)
    {
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"  predicted shift windows ({shifts.Solvent ?? "solvent not stated"}):\n");
        Lines(text, "1H", shifts.Hydrogen);
        Lines(text, "13C", shifts.Carbon);
        return text.ToString();
    }

    public static void Json(Utf8JsonWriter json, ClassShifts shifts)
    {
        if (shifts.Solvent is not null) json.WriteString("shiftSolvent", shifts.Solvent);
        Array(json, "hydrogenShiftWindows", shifts.Hydrogen);
        Array(json, "carbonShiftWindows", shifts.Carbon);
    }

    private static void Lines(StringBuilder text, string nucleus, IReadOnlyList<ShiftPrediction> predictions)
    {
        for (var c = 0; c < predictions.Count; c++)
        {
            var w = predictions[c].Window;
            text.Append(CultureInfo.InvariantCulture,
                $"    {nucleus} class {c}: {w.Low:0.0#}–{w.High:0.0#} ppm, most likely {w.MostLikely:0.0#} ({string.Join("; ", predictions[c].Reasons)})\n");
        }
    }

    private static void Array(Utf8JsonWriter json, string name, IReadOnlyList<ShiftPrediction> predictions)
    {
        json.WriteStartArray(name);
        foreach (var p in predictions)
        {
            json.WriteStartObject();
            json.WriteNumber("low", Math.Round(p.Window.Low, 2));
            json.WriteNumber("high", Math.Round(p.Window.High, 2));
            json.WriteNumber("mostLikely", Math.Round(p.Window.MostLikely, 2));
            json.WriteString("basis", p.Basis.ToString());
            json.WriteStartArray("reasons");
            foreach (var reason in p.Reasons) json.WriteStringValue(reason);
            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }
}
