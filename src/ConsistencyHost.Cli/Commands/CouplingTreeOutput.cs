using System.Globalization;
using System.Text;
using System.Text.Json;
using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

namespace ConsistencyHost.Cli.Commands;

/// <summary>The coupling tree of each hydrogen class, as <c>environments</c> prints it (text and JSON).</summary>
internal static class CouplingTreeOutput
{
    public static IReadOnlyList<CouplingTree> Of(Molecule molecule)
    {
        var equivalence = NmrEquivalence.Of(molecule);
        return CouplingTreeBuilder.Build(PredictionContext.Of(molecule, equivalence.Rings, equivalence.Aromaticity), equivalence);
    }

    public static string Text(IReadOnlyList<CouplingTree> trees)
    {
        var text = new StringBuilder();
        foreach (var tree in trees)
        {
            var (firstOrder, merged) = tree.ExpectedPattern();
            var links = tree.Links.Count == 0 ? "no partners" : string.Join("; ", tree.Links.Select(Link));
            text.Append(CultureInfo.InvariantCulture, $"  H class {tree.ClassIndex}: {firstOrder}{(merged is null ? "" : " (merged " + merged + ")")} — {links}\n");
        }

        return text.ToString();
    }

    public static void Json(Utf8JsonWriter json, IReadOnlyList<CouplingTree> trees)
    {
        json.WriteStartArray("couplingTrees");
        foreach (var tree in trees)
        {
            var (firstOrder, merged) = tree.ExpectedPattern();
            json.WriteStartObject();
            json.WriteNumber("class", tree.ClassIndex);
            json.WriteString("pattern", firstOrder);
            if (merged is not null) json.WriteString("mergedPattern", merged);
            json.WriteStartArray("couplings");
            foreach (var l in tree.Links)
            {
                json.WriteStartObject();
                if (l.IsHeteronuclear) json.WriteNumber("atom", l.PartnerAtom); else json.WriteNumber("partnerClass", l.PartnerClass);
                json.WriteNumber("count", l.Count);
                json.WriteNumber("bonds", l.Bonds);
                json.WriteString("type", l.Type.ToString());
                json.WriteNumber("minHz", l.Range.LowHz);
                json.WriteNumber("maxHz", l.Range.HighHz);
                json.WriteBoolean("mayVanish", l.Range.MayVanish);
                json.WriteString("source", l.Range.Source);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static string Link(CouplingLink l) => string.Create(CultureInfo.InvariantCulture,
        $"{(l.IsHeteronuclear ? "atom " + l.PartnerAtom : l.Count + " H of class " + l.PartnerClass)} {l.Bonds}J {l.Type} {l.Range.LowHz:0.#}–{l.Range.HighHz:0.#} Hz{(l.Range.MayVanish ? " (may vanish)" : "")}");
}
