using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Unsaturated;

/// <summary>Alkene carbons by the increments of <see cref="AlkeneIncrements"/>; allene carbons tabulated.</summary>
/// <remarks>
/// Ring alkenes: cyclohexene 127.3 and cyclopentene 130.8 (from memory, Pretsch et al. 2009) lie 3.3 and 1.3 ppm
/// below the open-chain sum; those are the ring corrections. Allenes (from memory): central carbon 200–215, terminal
/// carbons 74–100.
/// </remarks>
internal static class AlkeneCarbons
{
    /// <summary>The window of alkene carbon <paramref name="carbon"/> double-bonded to carbon <paramref name="partner"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int partner)
    {
        var m = context.Molecule;
        if (HasSecondDoubleBond(m, carbon, partner) || HasSecondDoubleBond(m, partner, carbon))
        {
            return Allene(m, carbon, partner);
        }

        var estimate = new CarbonEstimate().Base("base C=C", AlkeneIncrements.Base);
        var own = AddSide(context, carbon, partner, estimate, ownSide: true);
        var other = AddSide(context, partner, carbon, estimate, ownSide: false);
        Steric(estimate, own, other);
        var inRing = AddRing(context, carbon, partner, estimate);
        var cisKnown = inRing || AddCis(context, carbon, partner, own, other, estimate);
        estimate.Widen(2.0 + 0.5 * (own.Count + other.Count) + own.Spread + other.Spread + (inRing ? 1.5 : 0)
            + (own.Count == 1 && other.Count == 1 && !cisKnown ? 0.6 : 0));
        return estimate.Build(ShiftBasis.Increments, "substituents (increment error)", own.Count + other.Count);
    }

    private static bool HasSecondDoubleBond(Chemistry.Model.Molecule m, int carbon, int partner)
    {
        var neighbours = m.Neighbours(carbon);
        var bonds = m.BondsOf(carbon);
        for (var i = 0; i < neighbours.Length; i++)
        {
            if (neighbours[i] != partner && m.Bonds[bonds[i]].Order == 2)
            {
                return true;
            }
        }

        return false;
    }

    private static ShiftPrediction Allene(Chemistry.Model.Molecule m, int carbon, int partner) =>
        HasSecondDoubleBond(m, carbon, partner)
            ? new Tabulated(207.0, 9.0, "allene central carbon").ToPrediction()
            : new Tabulated(88.0, 15.0, "allene terminal carbon").ToPrediction();

    private static Side AddSide(PredictionContext context, int atom, int across, CarbonEstimate estimate, bool ownSide)
    {
        var m = context.Molecule;
        var side = default(Side);
        foreach (var x in m.Neighbours(atom))
        {
            if (x == across)
            {
                continue;
            }

            side.Count++;
            var group = GroupClassifier.Classify(context, atom, x);
            if (group == Group.Alkyl)
            {
                side.Alkyl++;
                var (beta, gamma, hetero, most) = ChainWalk.CountWithBranching(context, atom, x);
                side.BranchedBeta |= most >= 2;
                AddAlkyl(estimate, ownSide, 1, 1);
                AddAlkyl(estimate, ownSide, 2, beta);
                AddAlkyl(estimate, ownSide, 3, gamma);
                side.Spread += hetero;
                continue;
            }

            estimate.Add(ownSide ? AlkeneIncrements.OwnLabel(group) : AlkeneIncrements.OtherLabel(group),
                ownSide ? AlkeneIncrements.Own(group) : AlkeneIncrements.Other(group));
            side.Spread += AlkeneIncrements.Spread(group);
        }

        return side;
    }

    private static void AddAlkyl(CarbonEstimate estimate, bool ownSide, int position, int times)
    {
        for (var i = 0; i < times; i++)
        {
            estimate.Add(ownSide ? AlkeneIncrements.OwnAlkylLabels[position] : AlkeneIncrements.OtherAlkylLabels[position],
                ownSide ? AlkeneIncrements.OwnAlkyl[position] : AlkeneIncrements.OtherAlkyl[position]);
        }
    }

    private static void Steric(CarbonEstimate estimate, Side own, Side other)
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
    private static bool AddCis(PredictionContext context, int carbon, int partner, Side own, Side other, CarbonEstimate estimate)
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
    private static bool? Configuration(Chemistry.Model.Molecule m, int carbon, int partner)
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

    private static bool AddRing(PredictionContext context, int carbon, int partner, CarbonEstimate estimate)
    {
        if (!context.Rings.BondInRing[context.Molecule.BondBetween(carbon, partner)])
        {
            return false;
        }

        var size = RingFacts.Of(context).SmallestSize[carbon];
        estimate.Add("cis pair", -1.1);
        estimate.AddNonZero(size == 6 ? "6-ring C=C" : "5-ring C=C", size switch { 6 => -3.3, 5 => -1.3, _ => 0 });
        return true;
    }

    private struct Side
    {
        public int Count;
        public int Alkyl;
        public bool BranchedBeta;
        public double Spread;
    }
}
