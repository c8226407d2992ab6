namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

/// <summary>Small structural questions the shift tables ask about one atom; plain loops over the bond arrays.</summary>
internal static class AtomFacts
{
    /// <summary>Number of double bonds from <paramref name="atom"/> to atoms of element <paramref name="element"/>.</summary>
    public static int DoubleBondsTo(PredictionContext context, int atom, int element) => BondsTo(context, atom, element, 2);

    /// <summary>Number of non-aromatic bonds of <paramref name="order"/> from <paramref name="atom"/> to element <paramref name="element"/>.</summary>
    public static int BondsTo(PredictionContext context, int atom, int element, int order)
    {
        var m = context.Molecule;
        var count = 0;
        var bonds = m.BondsOf(atom);
        var neighbours = m.Neighbours(atom);
        for (var k = 0; k < bonds.Length; k++)
        {
            if (m.Bonds[bonds[k]].Order == order && m.Atoms[neighbours[k]].AtomicNumber == element && !context.IsAromaticBond(atom, neighbours[k]))
            {
                count++;
            }
        }

        return count;
    }

    /// <summary>True for a carbon doubly bonded (not aromatically) to O or S: a carbonyl or thiocarbonyl carbon.</summary>
    public static bool IsCarbonylCarbon(PredictionContext context, int atom) =>
        context.Molecule.Atoms[atom].AtomicNumber == 6 && (DoubleBondsTo(context, atom, 8) > 0 || DoubleBondsTo(context, atom, 16) > 0);

    /// <summary>True for a carbon with a C≡N.</summary>
    public static bool IsNitrileCarbon(PredictionContext context, int atom)
    {
        var m = context.Molecule;
        var bonds = m.BondsOf(atom);
        var neighbours = m.Neighbours(atom);
        for (var k = 0; k < bonds.Length; k++)
        {
            if (m.Bonds[bonds[k]].Order == 3 && m.Atoms[neighbours[k]].AtomicNumber == 7)
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>True for a non-aromatic carbon whose bonds are all single (an sp3 carbon).</summary>
    public static bool IsSaturatedCarbon(PredictionContext context, int atom)
    {
        var m = context.Molecule;
        if (m.Atoms[atom].AtomicNumber != 6 || context.IsAromatic(atom))
        {
            return false;
        }

        foreach (var b in m.BondsOf(atom))
        {
            if (m.Bonds[b].Order != 1)
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>True when the atom has a non-aromatic double bond to carbon (C=C) or is aromatic.</summary>
    public static bool IsPiCarbon(PredictionContext context, int atom) =>
        context.Molecule.Atoms[atom].AtomicNumber == 6 && (context.IsAromatic(atom) || DoubleBondsTo(context, atom, 6) > 0);

    /// <summary>A pyridine-type ring nitrogen: aromatic, neutral, two ring bonds and no hydrogen.</summary>
    public static bool IsPyridineNitrogen(PredictionContext context, int atom)
    {
        var a = context.Molecule.Atoms[atom];
        return a.AtomicNumber == 7 && context.IsAromatic(atom) && a.Charge == 0 && a.HydrogenCount == 0
            && context.Molecule.Degree(atom) == 2;
    }

    /// <summary>True when an aromatic atom has a pyridine-type nitrogen next to it in its ring.</summary>
    public static bool IsNextToPyridineNitrogen(PredictionContext context, int atom)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (IsPyridineNitrogen(context, n) && context.IsAromaticBond(atom, n))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>True when <paramref name="atom"/> has a neighbour other than <paramref name="except"/> of element <paramref name="element"/>.</summary>
    public static bool HasNeighbour(PredictionContext context, int atom, int except, int element)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (n != except && context.Molecule.Atoms[n].AtomicNumber == element)
            {
                return true;
            }
        }

        return false;
    }
}
