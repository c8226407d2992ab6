using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>
/// C=O carbons without a carbon side: formates, formamides, carbonates, carbamates, ureas, chloroformates and their
/// sulfur analogues.
/// </summary>
/// <remarks>
/// From memory (Pretsch et al. 2009; Kalinowski et al. 1988): ethyl formate 161.0, formic acid 166.3, DMF 162.6
/// (Gottlieb 1997: 162.62), N-alkylformamides 161–165 (rotamers); carbamates: Boc-NH-alkyl 155.9, Cbz-NH 156.4,
/// Boc-N(alkyl)2 154.7, Boc-NH-aryl 152.7, N-Boc azoles 147–150, N-Boc imides 150–153, oxazolidin-2-ones 158–160;
/// ureas: N,N′-dialkyl 158.5, N-aryl-N′-alkyl 155.5, N,N′-diaryl 152.8, tetraalkyl 164–166, 2-imidazolidinones
/// 162–164; carbonates: diethyl 155.1, diphenyl 152.0, Boc-O-alkyl 153.3, Boc2O 146.9, 1,3-dioxan-2-one 148.7;
/// chloroformates 150–151, carbamoyl chlorides 148–150; S-thiocarbonates 166–172, thiocarbamates 164–170.
/// </remarks>
internal static class HeteroCarbonyls
{
    /// <summary>The window of a carbonyl carbon with no carbon neighbour.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, CarbonylNeighbours n, string? solvent)
    {
        var m = context.Molecule;
        var a = n.First < 0 ? 1 : m.Atoms[n.First].AtomicNumber;
        var b = n.Second < 0 ? 1 : m.Atoms[n.Second].AtomicNumber;
        var (low, high) = a <= b ? (a, b) : (b, a);
        var estimate = (low, high) switch
        {
            (1, 1) => new Tabulated(194.0, 6.0, "formaldehyde C=O").ToEstimate(),
            (1, Topology.Oxygen) => new Tabulated(m.Atoms[n.First].HydrogenCount > 0 ? 166.0 : 160.8, 2.8, "formate C=O").ToEstimate(),
            (1, Topology.Nitrogen) => new Tabulated(162.3, 3.2, "formamide C=O").ToEstimate(),
            (Topology.Nitrogen, Topology.Oxygen) => Carbamate(context, carbon, n),
            (Topology.Nitrogen, Topology.Nitrogen) => Urea(context, carbon, n),
            (Topology.Oxygen, Topology.Oxygen) => Carbonate(context, carbon, n),
            (Topology.Oxygen, 17) => new Tabulated(150.5, 3.0, "chloroformate C=O").ToEstimate(),
            (Topology.Nitrogen, 17) => new Tabulated(149.0, 3.0, "carbamoyl chloride C=O").ToEstimate(),
            (Topology.Oxygen, Topology.Sulfur) => new Tabulated(169.0, 5.0, "thiocarbonate C=O").ToEstimate(),
            (Topology.Nitrogen, Topology.Sulfur) => new Tabulated(167.0, 5.0, "thiocarbamate C=O").ToEstimate(),
            _ => new Tabulated(165.0, 25.0, "heteroatom C=O").ToEstimate(),
        };
        var (shift, widen) = SolventEffects.Carbonyl(solvent);
        estimate.AddNonZero("solvent", shift);
        estimate.Widen(widen);
        return estimate.Build(ShiftBasis.TabulatedEnvironment, "type range");
    }

    private static CarbonEstimate Carbamate(PredictionContext context, int carbon, CarbonylNeighbours n)
    {
        var m = context.Molecule;
        var (nitrogen, oxygen) = m.Atoms[n.First].AtomicNumber == Topology.Nitrogen ? (n.First, n.Second) : (n.Second, n.First);
        var estimate = new CarbonEstimate().Base("carbamate C=O", 156.0);
        estimate.Widen(2.5);
        NitrogenTerms.Add(context, carbon, nitrogen, estimate, urea: false);
        if (OnAryl(context, carbon, oxygen))
        {
            estimate.Add("O-aryl", -1.8);
        }

        Ring(context, carbon, estimate, five: 3.0, six: -2.5);
        return estimate;
    }

    private static CarbonEstimate Urea(PredictionContext context, int carbon, CarbonylNeighbours n)
    {
        var estimate = new CarbonEstimate().Base("urea C=O", 158.5);
        estimate.Widen(3.0);
        var substituents = NitrogenTerms.Add(context, carbon, n.First, estimate, urea: true)
            + NitrogenTerms.Add(context, carbon, n.Second, estimate, urea: true);
        if (substituents >= 4)
        {
            estimate.Add("tetrasubstituted urea", 6.5);
            estimate.Widen(1.5);
        }

        Ring(context, carbon, estimate, five: 4.5, six: -2.5);
        return estimate;
    }

    private static CarbonEstimate Carbonate(PredictionContext context, int carbon, CarbonylNeighbours n)
    {
        var m = context.Molecule;
        var estimate = new CarbonEstimate().Base("carbonate C=O", 155.0);
        estimate.Widen(2.5);
        CarbonateOxygen(context, carbon, n.First, estimate);
        CarbonateOxygen(context, carbon, n.Second, estimate);
        Ring(context, carbon, estimate, five: 0.0, six: -6.4);
        return estimate;
    }

    private static void CarbonateOxygen(PredictionContext context, int carbon, int o, CarbonEstimate estimate)
    {
        var m = context.Molecule;
        if (m.Atoms[o].HydrogenCount > 0 || m.Atoms[o].Charge < 0)
        {
            estimate.Add("O–H/O⁻", 2.0);
            estimate.Widen(2.0);
        }
        else if (OnAryl(context, carbon, o))
        {
            estimate.Add("O-aryl", -1.5);
        }
        else if (OnCarbonyl(context, carbon, o))
        {
            estimate.Add("O-acyl", -8.0);
        }
        else if (OnTertiaryCarbon(context, carbon, o))
        {
            estimate.Add("O-tert-alkyl", -1.8);
        }
    }

    private static void Ring(PredictionContext context, int carbon, CarbonEstimate estimate, double five, double six)
    {
        switch (RingFacts.Of(context).SmallestSize[carbon])
        {
            case 5: estimate.AddNonZero("5-ring", five); estimate.Widen(1.0); break;
            case 6: estimate.Add("6-ring", six); estimate.Widen(1.0); break;
        }
    }

    private static bool OnAryl(PredictionContext context, int carbon, int oxygen) => Beyond(context, carbon, oxygen, static (c, x) => c.IsAromatic(x));

    private static bool OnCarbonyl(PredictionContext context, int carbon, int oxygen) =>
        Beyond(context, carbon, oxygen, static (c, x) => Topology.IsCarbonylCarbon(c.Molecule, x));

    private static bool OnTertiaryCarbon(PredictionContext context, int carbon, int oxygen) =>
        Beyond(context, carbon, oxygen, static (c, x) => Topology.IsSp3Carbon(c, x) && c.Molecule.Degree(x) >= 4);

    private static bool Beyond(PredictionContext context, int carbon, int hetero, Func<PredictionContext, int, bool> test)
    {
        foreach (var x in context.Molecule.Neighbours(hetero))
        {
            if (x != carbon && test(context, x))
            {
                return true;
            }
        }

        return false;
    }
}
