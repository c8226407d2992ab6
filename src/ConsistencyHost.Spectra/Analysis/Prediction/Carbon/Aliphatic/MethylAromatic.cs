using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>Methyl groups on aromatic rings: toluene 21.5, lower with ortho substituents, spread on heteroarenes.</summary>
/// <remarks>
/// From memory (Pretsch et al. 2009; Kalinowski et al. 1988): toluene 21.5 (Gottlieb 1997: 21.46), o-xylene 19.7,
/// 2-methylanisole 16.3, 1-methylnaphthalene 19.4; 2-/3-/4-picoline 24.5/18.4/21.0, 2-methylquinoline 25.3,
/// 2-methylpyrimidine 26.0; 2-methylfuran 13.4, 2-methylthiophene 15.0, 3-methylindole 9.7, 2-methylindole 13.7,
/// 2-methylbenzimidazole 14.8, methylisoxazoles 11–12, 2-methylthiazole 19.1; methyls ortho to OMe/OH/NR 15–17.
/// </remarks>
internal static class MethylAromatic
{
    private static bool HasHeteroSubstituent(PredictionContext context, int ringAtom)
    {
        foreach (var y in context.Molecule.Neighbours(ringAtom))
        {
            if (!context.IsAromatic(y) && context.Molecule.Atoms[y].AtomicNumber is Topology.Oxygen or Topology.Nitrogen)
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>The window of a methyl on aromatic atom <paramref name="ring"/>.</summary>
    public static Tabulated Lookup(PredictionContext context, int ring)
    {
        var facts = Aromatic.AromaticFacts.Of(context);
        if (facts.IsFiveRingHeteroaryl(ring))
        {
            return new(14.5, 6.0, "CH3 on 5-ring heteroarene");
        }

        var m = context.Molecule;
        var orthoSubstituted = 0;
        var orthoHetero = false;
        var nextToNitrogen = false;
        foreach (var o in m.Neighbours(ring))
        {
            if (!context.IsAromatic(o))
            {
                continue;
            }

            nextToNitrogen |= m.Atoms[o].AtomicNumber == Topology.Nitrogen;
            if (m.Atoms[o].AtomicNumber == Topology.Carbon && m.Degree(o) >= 3)
            {
                orthoSubstituted++;
                orthoHetero |= HasHeteroSubstituent(context, o);
            }
        }

        if (facts.RingHasHetero[ring])
        {
            return nextToNitrogen ? new(24.5, 3.5, "CH3 next to ring N") : new(19.5, 4.0, "CH3 on azine");
        }

        if (orthoHetero)
        {
            return new(16.5, 3.0, "CH3–aryl, ortho O/N");
        }

        return orthoSubstituted switch
        {
            0 => new(21.3, 2.2, "CH3–aryl"),
            1 => new(19.5, 3.5, "CH3–aryl, one ortho substituent"),
            _ => new(18.0, 5.0, "CH3–aryl, two ortho substituents"),
        };
    }
}
