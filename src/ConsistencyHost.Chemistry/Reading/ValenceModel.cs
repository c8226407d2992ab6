using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Reading;

/// <summary>Default valences and implicit hydrogen counts.</summary>
/// <remarks>A charged atom takes the valences of its isoelectronic neutral neighbour in the periodic table
/// (N+ like C, O+ like N, C- like N, O- like F), which is the MDL valence model for the main-group elements
/// and also reproduces OpenSMILES' organic subset for neutral atoms.</remarks>
internal static class ValenceModel
{
    /// <summary>Implicit H for a bond order sum, or -1 when the sum exceeds every allowed valence.</summary>
    public static int ImplicitHydrogens(int atomicNumber, int charge, int bondOrderSum, int radical = 0)
    {
        var valences = ValencesOf(atomicNumber, charge);
        if (valences.Count == 0)
        {
            return 0;
        }

        var used = bondOrderSum + radical;
        foreach (var v in valences)
        {
            if (v >= used)
            {
                return v - used;
            }
        }

        return -1;
    }

    /// <summary>Largest allowed valence, or int.MaxValue when the element has no valence model.</summary>
    public static int MaxValence(int atomicNumber, int charge)
    {
        var valences = ValencesOf(atomicNumber, charge);
        return valences.Count == 0 ? int.MaxValue : valences[^1];
    }

    /// <summary>True when an aromatic atom with this σ bond-order sum and H count must take one π (double) bond.</summary>
    public static bool NeedsPiBond(int atomicNumber, int charge, int sigmaSum, int hydrogens)
    {
        var valences = ValencesOf(atomicNumber, charge);
        var used = sigmaSum + hydrogens;
        foreach (var v in valences)
        {
            if (v >= used)
            {
                return v > used;
            }
        }

        return false;
    }

    internal static IReadOnlyList<int> ValencesOf(int atomicNumber, int charge)
    {
        var effective = atomicNumber - charge;
        if (atomicNumber is < 5 or > 53 || effective is < 5 or > 53 || Math.Abs(charge) > 2)
        {
            return [];
        }

        // Only main-group rows 2-5 (B..F, Si..Cl, As..Br, Te, I) carry a valence model.
        var e = Elements.ByAtomicNumber(effective);
        var sameRow = Row(effective) == Row(atomicNumber);
        return e is not null && sameRow ? e.DefaultValences : [];
    }

    private static int Row(int z) => z switch
    {
        <= 2 => 1,
        <= 10 => 2,
        <= 18 => 3,
        <= 36 => 4,
        _ => 5,
    };
}
