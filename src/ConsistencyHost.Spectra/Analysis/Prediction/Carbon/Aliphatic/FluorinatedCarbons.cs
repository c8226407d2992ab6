using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>CF3, CF2 and CHF2 carbons, tabulated by what carries them, with room for their C–F multiplet lines.</summary>
/// <remarks>
/// From memory (Pretsch et al. 2009, 13C of fluorine compounds): ArCF3 124.0
/// (q, 1J ≈ 272 Hz), heteroaryl–CF3 120–123.5, CF3–C(O) 114–117 (q, ≈ 285 Hz), alkyl–CF3 124–128 (q, ≈ 278 Hz),
/// ArOCF3 120.5 (q, ≈ 257 Hz), triflate 118.6 (q, ≈ 320 Hz), triflyl 119.8 (q, ≈ 326 Hz), SCF3 129.5 (q, ≈ 308 Hz);
/// ArCHF2 114.5 (t, ≈ 238 Hz), CF2 in chains and rings 112–125 (t, ≈ 240–250 Hz). Authors report either the centre or
/// every line: the outer quartet lines lie ±1.5 J from the centre, the outer triplet lines ±J (at 100 MHz, 272 Hz
/// is 2.7 ppm).
/// </remarks>
internal static class FluorinatedCarbons
{
    private const double QuartetLines = 4.1;
    private const double TripletLines = 2.4;

    /// <summary>The window of a carbon bearing two or three fluorines.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, HeteroCount count)
    {
        var row = count.F >= 3 ? Trifluoromethyl(context, carbon, count) : Difluoro(context, carbon, count);
        var estimate = row.ToEstimate();
        estimate.Widen(count.F >= 3 ? "C–F quartet lines" : "C–F triplet lines", count.F >= 3 ? QuartetLines : TripletLines);
        return estimate.Build(ShiftBasis.TabulatedEnvironment, "tabulated range and multiplet");
    }

    private static Tabulated Trifluoromethyl(PredictionContext context, int carbon, HeteroCount count)
    {
        var m = context.Molecule;
        if (count.F >= 4)
        {
            return new(123.0, 3.0, "CF4");
        }

        foreach (var x in m.Neighbours(carbon))
        {
            var z = m.Atoms[x].AtomicNumber;
            if (z == 9)
            {
                continue;
            }

            return z switch
            {
                Topology.Oxygen => BondedToSulfonyl(context, x) ? new(118.6, 2.0, "CF3–OSO2 (triflate)") : new(120.5, 2.0, "CF3–O"),
                Topology.Sulfur => Topology.DoubleBondedOxygens(m, x) >= 2 ? new(119.8, 2.0, "CF3–SO2") : new(129.6, 2.5, "CF3–S"),
                Topology.Nitrogen => new(119.5, 4.0, "CF3–N"),
                Topology.Carbon => OnCarbon(context, x),
                _ => new(122.0, 6.0, "CF3–X"),
            };
        }

        return new(118.0, 3.0, "CHF3");
    }

    private static Tabulated OnCarbon(PredictionContext context, int x)
    {
        var m = context.Molecule;
        if (context.IsAromatic(x))
        {
            return !Aromatic.AromaticFacts.Of(context).RingHasHetero[x] ? new(124.0, 2.0, "CF3–aryl") : new(121.5, 3.0, "CF3–heteroaryl");
        }

        if (Topology.IsCarbonylCarbon(m, x))
        {
            return new(115.8, 2.5, "CF3–C(O)");
        }

        if (Topology.IsSp3Carbon(context, x))
        {
            return new(125.8, 2.5, "CF3–C(sp3)");
        }

        return Topology.PartnerByOrder(m, x, 3) >= 0 ? new(114.0, 4.0, "CF3–C≡") : new(122.5, 3.5, "CF3–C=X");
    }

    private static Tabulated Difluoro(PredictionContext context, int carbon, HeteroCount count)
    {
        if (count.Total > count.F)
        {
            return new(117.0, 7.0, "CF2X");
        }

        return context.Molecule.Atoms[carbon].HydrogenCount > 0 ? new(114.5, 4.5, "CHF2") : new(119.0, 6.5, "CF2");
    }

    private static bool BondedToSulfonyl(PredictionContext context, int oxygen)
    {
        foreach (var x in context.Molecule.Neighbours(oxygen))
        {
            if (context.Molecule.Atoms[x].AtomicNumber == Topology.Sulfur)
            {
                return true;
            }
        }

        return false;
    }
}
