using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Olefinic;

/// <summary>The heavy substituents around a C=C seen from the H-bearing carbon: one geminal (or none), up to two on the
/// partner carbon, and how many of all of them conjugate with the double bond.</summary>
/// <param name="Geminal">The other substituent on the H-bearing carbon, or -1.</param>
/// <param name="First">A substituent on the partner carbon, or -1.</param>
/// <param name="Second">The other substituent on the partner carbon, or -1.</param>
/// <param name="Conjugating">How many substituents conjugate with the double bond.</param>
internal readonly record struct AlkeneSubstituents(int Geminal, int First, int Second, int Conjugating)
{
    /// <summary>Number of substituents.</summary>
    public int Count => (Geminal >= 0 ? 1 : 0) + (First >= 0 ? 1 : 0) + (Second >= 0 ? 1 : 0);

    /// <summary>Reads the substituents of the double bond <paramref name="carbon"/>=<paramref name="partner"/>.</summary>
    public static AlkeneSubstituents Of(PredictionContext context, int carbon, int partner)
    {
        int geminal = -1, first = -1, second = -1, conjugating = 0;
        foreach (var n in context.Molecule.Neighbours(carbon))
        {
            if (n != partner)
            {
                geminal = n;
                conjugating += Conjugates(context, carbon, n);
            }
        }

        foreach (var n in context.Molecule.Neighbours(partner))
        {
            if (n == carbon)
            {
                continue;
            }

            conjugating += Conjugates(context, partner, n);
            if (first < 0) first = n;
            else second = n;
        }

        return new AlkeneSubstituents(geminal, first, second, conjugating);
    }

    /// <summary>True when the "conj" row applies to <paramref name="kind"/>: another conjugating group is on the bond.</summary>
    public bool Conjugated(Substituent kind) => Conjugating - (AlkeneIncrements.IsConjugating(kind) ? 1 : 0) > 0;

    /// <summary>True when <paramref name="atom"/> shares a ring with the double bond (alkyl-ring row).</summary>
    public static bool InRingWith(PredictionContext context, int atom, int carbon, int partner)
    {
        foreach (var ring in context.Rings.Rings)
        {
            if (ring.Contains(atom) && ring.Contains(carbon) && ring.Contains(partner))
            {
                return true;
            }
        }

        return false;
    }

    private static int Conjugates(PredictionContext context, int from, int atom) =>
        AlkeneIncrements.IsConjugating(SubstituentClassifier.Classify(context, from, atom)) ? 1 : 0;
}
