using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>Amide carbonyls: terms for the nitrogen's substituents (the table is for N-alkyl secondary amides).</summary>
/// <remarks>
/// From memory (Pretsch et al. 2009): hexanamide 175.8 vs N-methylhexanamide 173.5 (NH2 +2.2); N,N-dialkyl about
/// −0.5, but tertiary benzamides and cinnamamides +3.5 higher than secondary ones (N,N-diethylbenzamide 171.2 vs
/// N-ethylbenzamide 167.5); acetanilide 168.4 (N-aryl −1.8), N-methylacetanilide 170.7; imides −1.5
/// (N-methylsuccinimide 177.2 vs N-methylpyrrolidinone 175.0 + ring); N-acylazoles and N-acylsulfonamides −1.5;
/// Weinreb amides +1.5; hydrazides −1. Formamides (no carbon side) are handled with the heteroatom carbonyls.
/// </remarks>
internal static class AmideModifiers
{
    /// <summary>Adds the nitrogen terms to an amide estimate.</summary>
    public static CarbonEstimate Apply(PredictionContext context, int carbonyl, CarbonEstimate estimate, int side, int nitrogen)
    {
        var m = context.Molecule;
        int hydrogens = m.Atoms[nitrogen].HydrogenCount, aryl = 0, acyl = 0, hetero = 0, alkyl = 0;
        foreach (var x in m.Neighbours(nitrogen))
        {
            if (x == carbonyl)
            {
                continue;
            }

            if (context.IsAromatic(x))
            {
                aryl++;
            }
            else if (Topology.IsCarbonylCarbon(m, x) || m.Atoms[x].AtomicNumber == Topology.Sulfur)
            {
                acyl++;
            }
            else if (m.Atoms[x].AtomicNumber != Topology.Carbon)
            {
                hetero++;
            }
            else
            {
                alkyl++;
            }
        }

        if (context.IsAromatic(nitrogen))
        {
            estimate.Add("N-acyl azole", -1.5);
            estimate.Widen(2.5);
            return estimate;
        }

        Apply(estimate, hydrogens, aryl, acyl, hetero, alkyl, Conjugated(context, carbonyl, side));
        return estimate;
    }

    private static void Apply(CarbonEstimate estimate, int hydrogens, int aryl, int acyl, int hetero, int alkyl, bool conjugated)
    {
        if (hydrogens >= 2)
        {
            estimate.Add("C(O)NH2", 2.2);
            return;
        }

        if (acyl > 0)
        {
            estimate.Add("imide / N-acyl", -1.5);
            estimate.Widen(1.5);
        }

        if (hetero > 0)
        {
            estimate.Add("N–O/N–N", 0.5);
            estimate.Widen(2.0);
        }

        if (aryl > 0)
        {
            estimate.Add(hydrogens > 0 ? "N-aryl" : "N-aryl, tertiary", hydrogens > 0 ? -1.8 : 0.5);
        }

        if (hydrogens == 0 && aryl == 0 && acyl == 0 && hetero == 0 && alkyl >= 2)
        {
            estimate.Add("tertiary amide", conjugated ? 3.5 : -0.5);
            estimate.Widen(1.0);
        }
    }

    private static bool Conjugated(PredictionContext context, int carbonyl, int side) =>
        CarbonylSide.Classify(context, carbonyl, side) is SideKind.Aryl or SideKind.FiveRingHeteroaryl or SideKind.SixRingHeteroaryl or SideKind.Vinyl;
}
