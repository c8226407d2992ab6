using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>
/// C=O carbons: the type is read from the two neighbours (C/H, O, N, S, halogen); acyl types add side terms,
/// heteroatom-only types (carbamate, urea, carbonate) are tabulated with nitrogen and oxygen modifiers.
/// </summary>
internal static class CarbonylCarbons
{
    /// <summary>The window of carbonyl carbon <paramref name="carbon"/> double-bonded to oxygen <paramref name="oxo"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int oxo, string? solvent)
    {
        var m = context.Molecule;
        var n = CarbonylNeighbours.Of(context, carbon, oxo);
        if (n.Carbons == 0)
        {
            return HeteroCarbonyls.Predict(context, carbon, n, solvent);
        }

        var other = n.Second;
        var otherElement = other < 0 ? 1 : m.Atoms[other].AtomicNumber;
        var estimate = otherElement switch
        {
            1 => Sides(context, carbon, CarbonylTables.Aldehyde, n.First, -1),
            Topology.Carbon => Sides(context, carbon, CarbonylTables.Ketone, n.First, other),
            Topology.Oxygen => OxygenAcyl(context, carbon, n.First, other),
            Topology.Nitrogen => AmideModifiers.Apply(context, carbon, Sides(context, carbon, CarbonylTables.Amide, n.First, -1), n.First, other),
            Topology.Sulfur => Sides(context, carbon, CarbonylTables.Thioester, n.First, -1),
            17 or 35 or 53 or 9 => AcidHalide(context, carbon, n.First, otherElement),
            _ => new Tabulated(190.0, 20.0, "C=O with unusual substituent").ToEstimate(),
        };

        AddRing(context, carbon, otherElement, estimate);
        var (shift, widen) = IsAcid(m, other) ? SolventEffects.Acid(solvent) : SolventEffects.Carbonyl(solvent);
        estimate.AddNonZero(SolventLabel(solvent), shift);
        estimate.Widen(widen);
        return estimate.Build(ShiftBasis.TabulatedEnvironment, "type range and sides");
    }

    /// <summary>The type's CH3-side value plus the terms of each carbon side.</summary>
    public static CarbonEstimate Sides(PredictionContext context, int carbon, CarbonylSideTable table, int first, int second)
    {
        var estimate = new CarbonEstimate().Base(table.Name, table.MethylSide);
        estimate.Widen(table.HalfWidth);
        var a = AddSide(context, carbon, table, first, estimate);
        if (second >= 0)
        {
            var b = AddSide(context, carbon, table, second, estimate);
            if (IsAromatic(a) && IsAromatic(b))
            {
                // Two aryl sides cannot both be coplanar (benzophenone 196.7, not 189).
                estimate.Add("two aryl sides", 7.4);
            }
        }

        return estimate;
    }

    private static SideKind AddSide(PredictionContext context, int carbon, CarbonylSideTable table, int side, CarbonEstimate estimate)
    {
        var kind = CarbonylSide.Classify(context, carbon, side);
        estimate.AddNonZero(table.Label(kind), table.Side(kind));
        if (kind is SideKind.Primary or SideKind.Secondary or SideKind.Tertiary)
        {
            estimate.Widen(1.2 * CarbonylSide.AddAlphaTerms(context, carbon, side, estimate));
        }

        estimate.Widen(kind switch
        {
            SideKind.FiveRingHeteroaryl or SideKind.SixRingHeteroaryl or SideKind.Other => 2.5,
            SideKind.Acyl => 4.0,
            SideKind.Alkynyl or SideKind.Perfluoroalkyl => 2.0,
            SideKind.Aryl or SideKind.Vinyl => 0.8,
            _ => 0,
        });
        if (kind == SideKind.Aryl)
        {
            ArylTwist.Add(context, side, table, estimate);
        }

        return kind;
    }

    private static bool IsAromatic(SideKind kind) => kind is SideKind.Aryl or SideKind.FiveRingHeteroaryl or SideKind.SixRingHeteroaryl;

    private static CarbonEstimate OxygenAcyl(PredictionContext context, int carbon, int side, int oxygen)
    {
        var m = context.Molecule;
        if (m.Atoms[oxygen].Charge < 0)
        {
            var carboxylate = Sides(context, carbon, CarbonylTables.Acid, side, -1);
            carboxylate.Add("carboxylate", 4.5);
            carboxylate.Widen(2.0);
            return carboxylate;
        }

        if (m.Atoms[oxygen].HydrogenCount > 0)
        {
            return Sides(context, carbon, CarbonylTables.Acid, side, -1);
        }

        foreach (var x in m.Neighbours(oxygen))
        {
            if (x != carbon && Topology.IsCarbonylCarbon(m, x))
            {
                return Sides(context, carbon, CarbonylTables.Anhydride, side, -1);
            }
        }

        return EsterModifiers.Apply(context, carbon, Sides(context, carbon, CarbonylTables.Ester, side, -1), oxygen);
    }

    private static CarbonEstimate AcidHalide(PredictionContext context, int carbon, int side, int halogen)
    {
        var estimate = Sides(context, carbon, CarbonylTables.AcidHalide, side, -1);
        estimate.AddNonZero(halogen switch { 35 => "C(O)Br", 9 => "C(O)F", 53 => "C(O)I", _ => "C(O)Cl" }, halogen switch { 35 => -4.5, 9 => -8.5, 53 => -8.0, _ => 0 });
        return estimate;
    }

    private static void AddRing(PredictionContext context, int carbon, int otherElement, CarbonEstimate estimate)
    {
        var size = RingFacts.Of(context).SmallestSize[carbon];
        if (size == 0)
        {
            return;
        }

        var table = otherElement switch
        {
            Topology.Carbon => CarbonylTables.Ketone,
            Topology.Oxygen => CarbonylTables.Ester,
            Topology.Nitrogen => CarbonylTables.Amide,
            _ => CarbonylTables.Anhydride,
        };
        estimate.AddNonZero(RingLabel(size), CarbonylTables.Ring(table, size));
        estimate.Widen(1.0);
    }

    private static string RingLabel(int size) => size switch
    {
        3 => "3-ring C=O",
        4 => "4-ring C=O",
        5 => "5-ring C=O",
        6 => "6-ring C=O",
        7 => "7-ring C=O",
        _ => "large-ring C=O",
    };

    private static bool IsAcid(Chemistry.Model.Molecule m, int other) =>
        other >= 0 && m.Atoms[other].AtomicNumber == Topology.Oxygen && m.Atoms[other].HydrogenCount > 0;

    private static string SolventLabel(string? solvent) => solvent switch
    {
        null => "solvent not given",
        "DMSO-d6" => "in DMSO-d6",
        "CD3OD" => "in CD3OD",
        "D2O" => "in D2O",
        "acetone-d6" => "in acetone-d6",
        "CD3CN" => "in CD3CN",
        "THF-d8" => "in THF-d8",
        _ => "in solvent",
    };
}
