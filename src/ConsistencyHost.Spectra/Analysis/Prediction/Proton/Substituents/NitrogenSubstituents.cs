namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

/// <summary>Classifies a group attached through nitrogen.</summary>
internal static class NitrogenSubstituents
{
    /// <summary>The kind of the nitrogen group <paramref name="atom"/> attached to <paramref name="from"/>.</summary>
    public static Substituent Classify(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        var a = m.Atoms[atom];
        if (AtomFacts.DoubleBondsTo(context, atom, 8) > 0 && CountNeighbours(context, atom, 8) >= 2)
        {
            return Substituent.Nitro;
        }

        if (context.IsAromatic(atom))
        {
            return Substituent.HeteroarylNitrogen;
        }

        if (a.Charge > 0 || m.Degree(atom) + a.HydrogenCount >= 4)
        {
            return Substituent.Ammonium;
        }

        if (AtomFacts.DoubleBondsTo(context, atom, 6) > 0 || AtomFacts.DoubleBondsTo(context, atom, 7) > 0)
        {
            return IsAzide(context, atom) ? Substituent.Azide : Substituent.IminoNitrogen;
        }

        return BySingleBondedNeighbours(context, from, atom);
    }

    private static Substituent BySingleBondedNeighbours(PredictionContext context, int from, int atom)
    {
        bool sulfonyl = false, conjugated = false;
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (n == from)
            {
                continue;
            }

            if (AtomFacts.IsCarbonylCarbon(context, n))
            {
                return Substituent.AmideNitrogen;
            }

            sulfonyl |= context.Molecule.Atoms[n].AtomicNumber == 16 && AtomFacts.DoubleBondsTo(context, n, 8) >= 2;
            conjugated |= AtomFacts.IsPiCarbon(context, n);
        }

        if (sulfonyl) return Substituent.SulfonamideNitrogen;
        if (conjugated) return Substituent.ArylAmine;
        return context.Molecule.Atoms[atom].HydrogenCount >= 2 ? Substituent.PrimaryAmine : Substituent.Amine;
    }

    private static bool IsAzide(PredictionContext context, int atom)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (context.Molecule.Atoms[n].AtomicNumber == 7 && AtomFacts.DoubleBondsTo(context, n, 7) + AtomFacts.BondsTo(context, n, 7, 3) >= 1
                && context.Molecule.Degree(n) == 2)
            {
                return true;
            }
        }

        return false;
    }

    private static int CountNeighbours(PredictionContext context, int atom, int element)
    {
        var count = 0;
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            count += context.Molecule.Atoms[n].AtomicNumber == element ? 1 : 0;
        }

        return count;
    }
}
