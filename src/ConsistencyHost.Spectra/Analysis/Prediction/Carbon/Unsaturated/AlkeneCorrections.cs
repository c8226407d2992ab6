using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Unsaturated;

/// <summary>Steric, cis and polarisation corrections of the alkene increment sum (sources on each method).</summary>
internal static class AlkeneCorrections
{
    /// <summary>Glagovich's steric terms: two α on the observed carbon, two α′ on the other, a branched β carbon.</summary>
    public static void Steric(CarbonEstimate estimate, AlkeneSide own, AlkeneSide other)
    {
        if (own.Alkyl >= 2)
        {
            estimate.Add("two α C", -4.8);
        }

        if (other.Alkyl >= 2)
        {
            estimate.Add("two α′ C", 2.5);
        }

        if (own.BranchedBeta)
        {
            estimate.Add("two alkyls on a β C", 2.3);
        }
    }

    /// <summary>
    /// The cis (Z) correction, once per pair of cis substituents: certain for tri- and tetrasubstituted alkenes, read
    /// from the drawn configuration for 1,2-disubstituted ones. Returns false when the geometry is not known.
    /// </summary>
    public static bool AddCis(PredictionContext context, int carbon, int partner, AlkeneSide own, AlkeneSide other, CarbonEstimate estimate)
    {
        if (own.Count == 0 || other.Count == 0)
        {
            return true;
        }

        var pairs = own.Count + other.Count - 2;
        if (own.Count == 1 && other.Count == 1)
        {
            var known = Configuration(context.Molecule, carbon, partner);
            if (known is null)
            {
                return false;
            }

            pairs = known.Value ? 1 : 0;
        }

        for (var i = 0; i < pairs; i++)
        {
            estimate.Add("cis pair", -1.1);
        }

        return true;
    }

    /// <summary>True for Z, false for E, null when not drawn (1,2-disubstituted alkene).</summary>
    public static bool? Configuration(Chemistry.Model.Molecule m, int carbon, int partner)
    {
        var bond = m.BondBetween(carbon, partner);
        foreach (var stereo in m.DoubleBondStereo)
        {
            if (stereo.Bond == bond)
            {
                return stereo.Configuration == Chemistry.Model.DoubleBondConfiguration.Cis;
            }
        }

        return null;
    }

    /// <summary>
    /// A conjugated acceptor deshields the β carbon more when that carbon is substituted and much more inside an
    /// enone or unsaturated lactone ring; the α carbon in such a ring sits higher too. Parents (from memory): methyl
    /// crotonate 144.7, (E)-pent-3-en-2-one 143.0, mesityl oxide 155, cyclohex-2-enone 151.0/129.9, cyclopent-2-enone
    /// 165.2/134.6, 2(5H)-furanone 153.4/121.4 (β/α).
    /// </summary>
    public static void Polarisation(CarbonEstimate estimate, AlkeneSide own, AlkeneSide other, bool inRing)
    {
        if (other.Acceptor && !own.Acceptor)
        {
            for (var i = 0; i < own.Alkyl; i++)
            {
                estimate.Add("substituted β carbon of acceptor", 4.0);
            }

            if (inRing && other.AcceptorInRing)
            {
                // Lactones and lactams polarise less than ketones (5,6-dihydro-2H-pyran-2-one C-4 145, from memory).
                estimate.Add(other.KetoneAcceptor ? "β carbon in enone ring" : "β carbon in unsaturated lactone/lactam ring",
                    other.KetoneAcceptor ? 16.0 : 5.0);
                estimate.Widen(other.KetoneAcceptor ? 3.0 : 5.0);
            }
        }
        else if (own.Acceptor && inRing && own.AcceptorInRing)
        {
            estimate.Add("α carbon in enone ring", 5.0);
            estimate.Widen(2.0);
        }
    }
}
