namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>Ortho crowding: a substituted ring carbon next to substituted ring carbons is less predictable.</summary>
internal static class RingCrowding
{
    /// <summary>Extra half-width for a substituted carbon with substituted ring neighbours (1 ppm each).</summary>
    public static double Of(PredictionContext context, int carbon)
    {
        var m = context.Molecule;
        if (!HasSubstituent(context, carbon))
        {
            return 0;
        }

        var crowded = 0.0;
        foreach (var x in m.Neighbours(carbon))
        {
            if (context.IsAromatic(x) && context.IsAromaticBond(carbon, x) && HasSubstituent(context, x))
            {
                crowded += 1.0;
            }
        }

        return crowded;
    }

    private static bool HasSubstituent(PredictionContext context, int ringAtom)
    {
        var m = context.Molecule;
        foreach (var x in m.Neighbours(ringAtom))
        {
            if (!(context.IsAromatic(x) && context.IsAromaticBond(ringAtom, x)))
            {
                return true;
            }
        }

        return false;
    }
}
