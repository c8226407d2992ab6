using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>
/// Where the α increments stop adding up: steric corrections for planar α groups, several functional groups on one
/// carbon, tert-alkyl esters and ethers, and benzylic carbons next to ortho substituents.
/// </summary>
/// <remarks>
/// Derived here from parent shifts (CDCl3, from memory of Pretsch et al. 2009 unless marked), not from single
/// entries:
/// planar α groups (aryl, vinyl, C=O) act in the Grant–Paul steric table as secondary carbons — cumene CH 34.2,
/// tert-butylbenzene C 34.6, 1,1-diphenylethane CH 44.8, 3-methyl-1-butene CH 32.3, 3-methyl-2-butanone CH 41.6,
/// pinacolone C 44.3 (carboxyl groups half: methyl isobutyrate CH 34.0, methyl pivalate C 38.7);
/// a second functional α group on a carbon that bears a heteroatom costs about 4 ppm — benzyl alcohol 65.2, benzyl
/// acetate 66.3, benzyl bromide 33.5, 1-phenylethanol 70.4, benzhydrol 76.3, alanine methyl ester Cα 50.0, methyl
/// lactate CH 66.8, allyl alcohol 63.7;
/// tert-alkyl esters and carbamates sit higher and tert-alkyl ethers lower than the sum — tert-butyl acetate 80.1,
/// Boc 79–85, MTBE 72.9 (Gottlieb 1997: 72.87);
/// ortho substituents on a benzylic aryl shield the benzylic carbon — 2-methoxytoluene CH3 16.3, 2-methylbenzyl
/// alcohol 63.5, bis(2-hydroxyphenyl)methane 30.8 against diphenylmethane 41.9.
/// </remarks>
internal static class Sp3Corrections
{
    /// <summary>Adds the corrections for sp3 carbon <paramref name="carbon"/>.</summary>
    public static void Add(PredictionContext context, int carbon, CarbonEstimate estimate)
    {
        var m = context.Molecule;
        var degree = m.Degree(carbon);
        int functional = 0, hetero = 0;
        foreach (var x in m.Neighbours(carbon))
        {
            var group = GroupClassifier.Classify(context, carbon, x);
            if (group is Group.Alkyl or Group.Alkynyl or Group.Nitrile or Group.Trifluoromethyl)
            {
                continue;
            }

            functional++;
            hetero += m.Atoms[x].AtomicNumber != Topology.Carbon ? 1 : 0;
            PlanarSteric(estimate, group, degree);
            TertiaryOxygen(estimate, group, degree);
            if (group == Group.Aryl)
            {
                BenzylicOrtho(context, x, estimate);
            }
        }

        for (var extra = 1; hetero > 0 && extra < functional; extra++)
        {
            estimate.Add("several α groups", -4.0);
            estimate.Widen(1.5);
        }
    }

    private static void PlanarSteric(CarbonEstimate estimate, Group group, int degree)
    {
        var scale = group switch
        {
            Group.Aryl or Group.Vinyl or Group.Acyl or Group.Formyl or Group.Imidoyl or Group.Thioacyl => 1.0,
            Group.CarboxylicAcid or Group.Carboxylate or Group.Ester or Group.Amide or Group.AcylHalide => 0.5,
            _ => 0.0,
        };
        estimate.AddNonZero("steric (planar α group)", scale * StericCorrections.Of(degree, 2));
    }

    private static void TertiaryOxygen(CarbonEstimate estimate, Group group, int degree)
    {
        if (degree < 4)
        {
            return;
        }

        if (group == Group.Acyloxy)
        {
            estimate.Add("tert-alkyl ester O", 6.5);
            estimate.Widen(2.0);
        }
        else if (group is Group.Alkoxy or Group.Aryloxy)
        {
            estimate.Add("tert-alkyl ether O", -4.0);
            estimate.Widen(2.0);
        }
    }

    private static void BenzylicOrtho(PredictionContext context, int ipso, CarbonEstimate estimate)
    {
        var m = context.Molecule;
        foreach (var o in m.Neighbours(ipso))
        {
            if (!context.IsAromatic(o) || !context.IsAromaticBond(ipso, o))
            {
                continue;
            }

            foreach (var y in m.Neighbours(o))
            {
                if (y == ipso || (context.IsAromatic(y) && context.IsAromaticBond(o, y) && RingFacts.Of(context).RingCount[o] < 2))
                {
                    continue;
                }

                var heteroOrtho = m.Atoms[y].AtomicNumber is Topology.Oxygen or Topology.Nitrogen && !context.IsAromatic(y);
                var fused = context.IsAromatic(y) && context.IsAromaticBond(o, y);
                estimate.Add(heteroOrtho ? "ortho O/N on benzylic aryl" : fused ? "peri ring" : "ortho substituent on benzylic aryl",
                    heteroOrtho ? -4.0 : fused ? -2.0 : -1.5);
                estimate.Widen(1.0);
                break;
            }
        }
    }
}
