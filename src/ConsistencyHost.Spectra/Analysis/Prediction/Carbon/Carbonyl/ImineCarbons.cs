using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>
/// C=N carbons (not aromatic): oximes, hydrazones, imines, sulfinyl/sulfonyl imines, amidines, guanidines, imidates,
/// isoureas, thioimidates, imidoyl chlorides, nitrones and iminium ions; tabulated by the nitrogen's substituent and
/// the carbon's other neighbours.
/// </summary>
/// <remarks>
/// From memory (Pretsch et al. 2009; Kalinowski et al. 1988): aldoximes 146–153 (benzaldoxime 150.4), ketoximes
/// 154–161 (acetone oxime 155.6, cyclohexanone oxime 160.6, cyclopentanone oxime 167), N,N-dialkylhydrazones of
/// aldehydes 132–140, aldehyde N-acyl/N-sulfonyl hydrazones 142–153, ketone hydrazones 145–165; aldimines 159–167
/// (N-benzylidene aniline 160.3), ketimines 164–178; N-sulfinyl aldimines 162–169, ketimines 175–187; N-sulfonyl
/// aldimines 170–171, ketimines 176–182; amidines 152–170, guanidines 152–161, imidates and 2-oxazolines 160–170,
/// isoureas 150–160, thioimidates and 2-thiazolines 160–172, imidoyl chlorides 140–146, nitrones 130–150, iminium
/// 165–185.
/// </remarks>
internal static class ImineCarbons
{
    /// <summary>The window of imine-type carbon <paramref name="carbon"/> double-bonded to nitrogen <paramref name="nitrogen"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int nitrogen)
    {
        var m = context.Molecule;
        int carbons = 0, n = 0, o = 0, s = 0, halogen = 0;
        foreach (var x in m.Neighbours(carbon))
        {
            if (x == nitrogen)
            {
                continue;
            }

            switch (m.Atoms[x].AtomicNumber)
            {
                case Topology.Carbon: carbons++; break;
                case Topology.Nitrogen: n++; break;
                case Topology.Oxygen: o++; break;
                case Topology.Sulfur: s++; break;
                default: halogen += Topology.IsHalogen(m.Atoms[x].AtomicNumber) ? 1 : 0; break;
            }
        }

        var row = (n, o, s, halogen) switch
        {
            (>= 2, _, _, _) => new Tabulated(156.5, 5.0, "guanidine C=N"),
            (1, 1, _, _) => new Tabulated(155.0, 6.0, "isourea C=N"),
            (1, _, 1, _) => new Tabulated(165.0, 8.0, "isothiourea C=N"),
            (1, _, _, _) => Amidine(context, carbon, nitrogen, carbons),
            (_, 1, _, _) => carbons == 0 ? new Tabulated(156.0, 6.0, "formimidate C=N") : new Tabulated(165.5, 5.0, "imidate C=N"),
            (_, _, 1, _) => new Tabulated(166.0, 7.0, "thioimidate C=N"),
            (_, _, _, >= 1) => new Tabulated(143.0, 5.0, "imidoyl halide C=N"),
            _ => ByNitrogen(context, carbon, nitrogen, carbons),
        };
        var estimate = row.ToEstimate();
        if (RingFacts.Of(context).SmallestSize[carbon] == 5 && n + o + s == 0)
        {
            estimate.Add("5-ring C=N", 6.0);
        }

        return estimate.Build(ShiftBasis.TabulatedEnvironment, "type range");
    }

    private static Tabulated Amidine(PredictionContext context, int carbon, int nitrogen, int carbons)
    {
        if (context.Molecule.Atoms[carbon].HydrogenCount > 0 || carbons == 0)
        {
            return new Tabulated(155.0, 5.0, "formamidine C=N");
        }

        return IsAromaticSide(context, carbon, nitrogen) ? new Tabulated(163.5, 6.0, "aryl amidine C=N") : new Tabulated(164.5, 7.0, "amidine C=N");
    }

    private static Tabulated ByNitrogen(PredictionContext context, int carbon, int nitrogen, int carbons)
    {
        var m = context.Molecule;
        var aldehyde = carbons < 2;
        if (m.Atoms[nitrogen].Charge > 0)
        {
            return HasOxide(m, nitrogen) ? (aldehyde ? new(137.0, 7.0, "aldonitrone C=N") : new(148.0, 7.0, "ketonitrone C=N"))
                : new(172.0, 12.0, "iminium C=N");
        }

        var beyond = OtherNeighbour(m, nitrogen, carbon);
        if (beyond < 0)
        {
            return aldehyde ? new(163.0, 8.0, "N–H aldimine C=N") : new(175.0, 10.0, "N–H ketimine C=N");
        }

        return m.Atoms[beyond].AtomicNumber switch
        {
            Topology.Oxygen => aldehyde ? new(149.5, 4.5, "aldoxime C=N") : new(157.5, 5.0, "ketoxime C=N"),
            Topology.Nitrogen => Hydrazone(context, beyond, aldehyde),
            Topology.Sulfur when Topology.DoubleBondedOxygens(m, beyond) >= 2 => aldehyde ? new(170.5, 3.0, "N-sulfonyl aldimine C=N") : new(179.0, 5.0, "N-sulfonyl ketimine C=N"),
            Topology.Sulfur => aldehyde ? new(164.5, 4.5, "N-sulfinyl aldimine C=N") : new(180.0, 8.0, "N-sulfinyl ketimine C=N"),
            _ => aldehyde ? new(162.0, 5.0, "aldimine C=N") : new(169.0, 7.0, "ketimine C=N"),
        };
    }

    private static Tabulated Hydrazone(PredictionContext context, int secondNitrogen, bool aldehyde)
    {
        var m = context.Molecule;
        var acylated = false;
        var dialkyl = m.Atoms[secondNitrogen].HydrogenCount == 0;
        foreach (var x in m.Neighbours(secondNitrogen))
        {
            acylated |= Topology.IsCarbonylCarbon(m, x) || (m.Atoms[x].AtomicNumber == Topology.Sulfur && Topology.DoubleBondedOxygens(m, x) >= 2);
        }

        if (!aldehyde)
        {
            return acylated ? new(155.0, 7.0, "ketone N-acyl/sulfonyl hydrazone C=N") : new(152.0, 12.0, "ketone hydrazone C=N");
        }

        return acylated ? new(146.5, 6.0, "aldehyde N-acyl/sulfonyl hydrazone C=N")
            : dialkyl ? new(136.0, 6.0, "aldehyde N,N-disubstituted hydrazone C=N")
            : new(141.0, 6.0, "aldehyde hydrazone C=N");
    }

    private static bool HasOxide(Chemistry.Model.Molecule m, int nitrogen)
    {
        foreach (var x in m.Neighbours(nitrogen))
        {
            if (m.Atoms[x].AtomicNumber == Topology.Oxygen && m.Atoms[x].Charge < 0)
            {
                return true;
            }
        }

        return false;
    }

    private static bool IsAromaticSide(PredictionContext context, int carbon, int nitrogen)
    {
        foreach (var x in context.Molecule.Neighbours(carbon))
        {
            if (x != nitrogen && context.IsAromatic(x))
            {
                return true;
            }
        }

        return false;
    }

    private static int OtherNeighbour(Chemistry.Model.Molecule m, int nitrogen, int except)
    {
        foreach (var x in m.Neighbours(nitrogen))
        {
            if (x != except)
            {
                return x;
            }
        }

        return -1;
    }
}
