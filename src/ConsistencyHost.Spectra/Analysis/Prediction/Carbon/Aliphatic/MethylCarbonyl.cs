using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>Acetyl methyls: methyl ketones by the other side, acetamides by the nitrogen.</summary>
/// <remarks>
/// From memory (Pretsch et al. 2009): acetone 30.9 (Gottlieb 1997: 30.92), 2-butanone 29.4, 3-methyl-2-butanone
/// 27.4, pinacolone 24.6, acetophenone 26.6, methyl vinyl ketone 26.3, 2-acetylpyridine 25.8, 2,3-butanedione
/// 23.8, acetylacetone (keto) 30.3, ethyl acetoacetate 30.1, acetaldehyde 31.2. Acetamides: N-alkyl 23.2,
/// acetanilide 24.5, N,N-dialkyl 21.5, N-methylacetanilide 22.4, acetamide 22.5. Imides (a second acyl on the
/// nitrogen, which then donates less to each carbonyl) move the acetyl methyl up: diacetamide 24.9,
/// N,N-diacetylaniline 26.1, 3-acetyl-2-oxazolidinone 23.8, N-acetylpyrrolidin-2-one 24.9.
/// </remarks>
internal static class MethylCarbonyl
{
    /// <summary>A methyl ketone (or acetaldehyde) methyl.</summary>
    public static Tabulated Ketone(PredictionContext context, int methyl, int carbonyl)
    {
        var m = context.Molecule;
        var side = OtherSide(context, methyl, carbonyl);
        if (side < 0)
        {
            return new(31.0, 2.0, "CH3–CHO");
        }

        if (!Topology.IsSp3Carbon(context, side))
        {
            return m.Atoms[side].AtomicNumber == Topology.Carbon && Topology.IsCarbonylCarbon(m, side)
                ? new(24.5, 2.5, "CH3–C(O)C(O)")
                : new(26.5, 2.5, "CH3–C(O)–aryl/vinyl");
        }

        if (Topology.CountHeteroNeighbours(m, side) > 0 || HasCarbonylNeighbour(context, side, carbonyl))
        {
            return new(28.0, 3.0, "CH3–C(O)–CX");
        }

        return m.Degree(side) switch
        {
            1 => new(30.5, 2.0, "CH3–C(O)–CH3"),
            2 => new(29.6, 2.0, "CH3–C(O)–CH2"),
            3 => new(27.8, 2.3, "CH3–C(O)–CH"),
            _ => new(25.0, 2.5, "CH3–C(O)–C"),
        };
    }

    /// <summary>An acetamide methyl.</summary>
    public static Tabulated Amide(PredictionContext context, int methyl, int carbonyl)
    {
        var m = context.Molecule;
        var nitrogen = OtherSide(context, methyl, carbonyl);
        var carbons = 0;
        var aryl = false;
        var acyl = false;
        foreach (var x in m.Neighbours(nitrogen))
        {
            if (x == carbonyl)
            {
                continue;
            }

            carbons++;
            aryl |= context.IsAromatic(x);
            acyl |= Topology.IsCarbonylCarbon(m, x);
        }

        if (acyl)
        {
            return new(24.9, 2.2, "CH3–C(O)N–C(O) (imide)");
        }

        return (carbons, aryl) switch
        {
            (0, _) => new(22.6, 2.0, "CH3–C(O)NH2"),
            (1, true) => new(24.4, 1.8, "CH3–C(O)NH–aryl"),
            (1, false) => new(23.2, 1.8, "CH3–C(O)NHR"),
            _ => new(22.0, 2.3, "CH3–C(O)NR2"),
        };
    }

    private static int OtherSide(PredictionContext context, int from, int carbonyl)
    {
        var m = context.Molecule;
        var neighbours = m.Neighbours(carbonyl);
        var bonds = m.BondsOf(carbonyl);
        for (var i = 0; i < neighbours.Length; i++)
        {
            if (neighbours[i] != from && m.Bonds[bonds[i]].Order == 1)
            {
                return neighbours[i];
            }
        }

        return -1;
    }

    private static bool HasCarbonylNeighbour(PredictionContext context, int atom, int except)
    {
        foreach (var x in context.Molecule.Neighbours(atom))
        {
            if (x != except && GroupClassifier.Classify(context, atom, x) is >= Group.Formyl and <= Group.AcylHalide)
            {
                return true;
            }
        }

        return false;
    }
}
