using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>Methyls on O, N, S and Si, tabulated by the heteroatom's other substituents.</summary>
/// <remarks>
/// From memory (Pretsch et al. 2009; Kalinowski et al. 1988) unless marked: MeO–CH2R 58.7, MeO–CHR2 56.5,
/// MeO–CR3 49.5 (MTBE 49.45, Gottlieb 1997), MOM and acetal OMe 52–56, MeOSO2R 56, MeO–N (Weinreb, oxime ethers)
/// 61.5; anisoles 55.3, 2,6-disubstituted anisoles 60–62, 2-methoxypyridines 53.3; methyl esters 51.0–52.8,
/// methyl carbonates 54.9; MeNH2 28.3, MeNHR 36, MeNR2 42–47, PhNHMe 30.8, PhNMe2 40.5; N-methyl amides: secondary
/// 26.3, tertiary 29–38 (DMF 36.5/31.5, Gottlieb 1997); methyl sulfones: MeSO2–alkyl 40–42, MeSO2Ar 44.5, mesylates
/// 37–39, methanesulfonamides 39–41; Si–CH3: TMS ethers −0.5–1, TBS −5.5 to −4.2, silicone grease 1.19
/// (Fulmer 2010).
/// </remarks>
internal static class MethylHetero
{
    /// <summary>CH3–O–R (R alkyl, Si, S, N, P).</summary>
    public static Tabulated Ether(PredictionContext context, int methyl, int oxygen)
    {
        var m = context.Molecule;
        var other = OtherNeighbour(m, oxygen, methyl);
        if (other >= 0 && m.Atoms[other].AtomicNumber == Topology.Nitrogen)
        {
            return new(61.8, 2.3, "CH3–O–N");
        }

        if (other < 0 || m.Atoms[other].AtomicNumber != Topology.Carbon)
        {
            return new(54.0, 4.0, "CH3–O–X");
        }

        if (!Topology.IsSp3Carbon(context, other))
        {
            return new(56.0, 4.0, "CH3–O–C=C");
        }

        if (Topology.CountNeighbours(m, other, Topology.Oxygen) >= 2)
        {
            return new(54.0, 3.5, "CH3–O–C–O (acetal)");
        }

        return m.Degree(other) switch
        {
            <= 2 => new(58.7, 2.3, "CH3–O–CH2"),
            3 => new(56.5, 2.5, "CH3–O–CH"),
            _ => new(49.8, 2.5, "CH3–O–C(quaternary)"),
        };
    }

    /// <summary>CH3–O–aryl: anisoles, di-ortho-substituted anisoles, methoxy azines.</summary>
    public static Tabulated ArylEther(PredictionContext context, int methyl, int oxygen)
    {
        var m = context.Molecule;
        var ring = OtherNeighbour(m, oxygen, methyl);
        var substitutedOrtho = 0;
        var nextToNitrogen = false;
        foreach (var o in m.Neighbours(ring))
        {
            if (o == oxygen || !context.IsAromatic(o))
            {
                continue;
            }

            nextToNitrogen |= m.Atoms[o].AtomicNumber == Topology.Nitrogen;
            if (m.Degree(o) >= 3)
            {
                substitutedOrtho++;
            }
        }

        return substitutedOrtho >= 2 ? new(60.5, 2.5, "CH3–O–aryl, both ortho substituted")
            : nextToNitrogen ? new(54.0, 2.0, "CH3–O next to ring N")
            : new(55.7, 2.0, "CH3–O–aryl");
    }

    /// <summary>CH3–O–C(=O): methyl esters, carbamates and carbonates.</summary>
    public static Tabulated EsterOxygen(PredictionContext context, int methyl, int oxygen)
    {
        var m = context.Molecule;
        var carbonyl = OtherNeighbour(m, oxygen, methyl);
        return Topology.CountNeighbours(m, carbonyl, Topology.Oxygen) >= 3
            ? new(55.0, 2.0, "CH3–O–C(O)O")
            : new(52.0, 2.0, "CH3–O–C(O)");
    }

    /// <summary>N-methyl amines by the nitrogen's other substituents.</summary>
    public static Tabulated Amine(PredictionContext context, int methyl, int nitrogen)
    {
        var m = context.Molecule;
        var others = 0;
        var aryl = 0;
        foreach (var x in m.Neighbours(nitrogen))
        {
            if (x == methyl)
            {
                continue;
            }

            others++;
            if (context.IsAromatic(x) || !Topology.IsSp3Carbon(context, x))
            {
                aryl++;
            }
        }

        return (others, aryl) switch
        {
            (0, _) => new(28.5, 3.0, "CH3–NH2"),
            (1, 1) => new(30.8, 2.5, "CH3–NH–aryl"),
            (1, _) => new(35.5, 3.0, "CH3–NHR"),
            (_, 0) => new(44.5, 4.0, "CH3–NR2"),
            (_, 1) => new(39.5, 3.0, "CH3–N(R)–aryl"),
            _ => new(40.0, 4.0, "CH3–NAr2"),
        };
    }

    /// <summary>N-methyl amides, carbamates and ureas.</summary>
    public static Tabulated AmideNitrogen(PredictionContext context, int methyl, int nitrogen)
    {
        var m = context.Molecule;
        return m.Atoms[nitrogen].HydrogenCount > 0
            ? new(27.0, 2.5, "CH3–NH–C(O)")
            : new(33.5, 5.5, "CH3–N(R)–C(O)");
    }

    private static int OtherNeighbour(Chemistry.Model.Molecule m, int hetero, int self)
    {
        foreach (var x in m.Neighbours(hetero))
        {
            if (x != self)
            {
                return x;
            }
        }

        return -1;
    }
}
