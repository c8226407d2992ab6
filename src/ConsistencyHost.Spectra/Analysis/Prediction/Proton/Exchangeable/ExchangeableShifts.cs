using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Exchangeable;

/// <summary>
/// Windows for O–H, N–H and S–H: the class's range in the solvent (wide: concentration, water and temperature move
/// them); in CD3OD and D2O the DMSO-d6 range joined with the solvent's exchange line, since these protons usually
/// exchange away and, if seen at all (slow amide exchange), sit near the DMSO-d6 values. Water uses the
/// residual-solvent table's water line.
/// </summary>
internal static class ExchangeableShifts
{
    /// <summary>The window for the hydrogens on heteroatom <paramref name="atom"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int atom, string? solvent)
    {
        var kind = ExchangeableClassifier.Classify(context, atom);
        return kind == ExchangeableKind.Water ? Water(solvent) : ForKind(kind, solvent);
    }

    private static ShiftPrediction ForKind(ExchangeableKind kind, string? solvent)
    {
        var ranges = ExchangeableRanges.Of(kind);
        var name = Describe(kind);
        switch (solvent)
        {
            case "CD3OD" or "D2O":
                var line = solvent == "D2O" ? 4.79 : 4.87;
                return Span(ranges.Dmso, name + " in " + solvent + ": normally exchanged (not observed); DMSO-d6 range or merged with HDO",
                    new Range(line - 0.4, line + 0.4, line));
            case null:
                return Span(ranges.Chloroform, name + ", solvent not given: CDCl3 to DMSO-d6 range", ranges.Dmso);
            default:
                var (range, group) = Pick(ranges, solvent);
                return Span(range, name + " in " + group, null);
        }
    }

    private static (Range Range, string Group) Pick(SolventRanges ranges, string solvent) => solvent switch
    {
        "DMSO-d6" => (ranges.Dmso, "DMSO-d6"),
        "acetone-d6" or "THF-d8" => (ranges.Acetone, solvent),
        "CD3CN" => (ranges.Acetonitrile, "CD3CN"),
        "C6D6" or "toluene-d8" => (ranges.Benzene, solvent),
        _ => (ranges.Chloroform, solvent),
    };

    private static ShiftPrediction Span(Range range, string reason, Range? also)
    {
        var estimate = new ProtonEstimate().Start(range.Likely, reason + " (class range)");
        estimate.Cover(range.Low, "range from");
        estimate.Cover(range.High, "range to");
        if (also is { } other)
        {
            estimate.Cover(other.Low, "also from");
            estimate.Cover(other.High, "also to");
        }

        return estimate.Finish(ShiftBasis.Exchangeable);
    }

    private static ShiftPrediction Water(string? solvent)
    {
        double? low = null, high = null;
        foreach (var line in ResidualSolventTable.Lines)
        {
            var applies = solvent is null ? line.Solvent is "CDCl3" or "DMSO-d6" : line.Solvent == solvent;
            var isWater = line.Kind == SolventLineKind.Water || (line.Solvent == "D2O" && line.Nucleus == Nucleus.H1);
            if (applies && isWater && line.Nucleus == Nucleus.H1)
            {
                low = Math.Min(low ?? line.ShiftPpm, line.ShiftPpm);
                high = Math.Max(high ?? line.ShiftPpm, line.ShiftPpm);
            }
        }

        // Dry-solvent water line (Gottlieb 1997); hydrogen-bonding solutes and acids move it downfield.
        var estimate = new ProtonEstimate().Start(low ?? 1.56, "water line in " + (solvent ?? "CDCl3/DMSO-d6") + " (residual-solvent table)");
        if (high is { } h) estimate.Cover(h, "water line up to");
        estimate.Stretch(0.25, 1.0, "hydrogen bonding and exchange move water downfield by up to +1.0");
        return estimate.Finish(ShiftBasis.Exchangeable);
    }

    private static string Describe(ExchangeableKind kind) => kind switch
    {
        ExchangeableKind.AlcoholOH => "alcohol O–H",
        ExchangeableKind.PhenolOH => "phenol O–H",
        ExchangeableKind.ChelatedOH => "chelated O–H (intramolecular H-bond)",
        ExchangeableKind.CarboxylicOH => "carboxylic acid O–H",
        ExchangeableKind.OximeOH => "oxime/hydroxamic O–H",
        ExchangeableKind.BoronicOH => "boronic acid O–H",
        ExchangeableKind.AlkylThiol => "alkyl S–H",
        ExchangeableKind.ArylThiol => "aryl S–H",
        ExchangeableKind.Other or ExchangeableKind.OtherOH => "exchangeable H",
        _ => kind.ToString().Replace("NH", " N–H", StringComparison.Ordinal),
    };
}
