using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Unsaturated;

/// <summary>Alkene carbons by the increments of <see cref="AlkeneIncrements"/>; allene carbons tabulated.</summary>
/// <remarks>
/// Ring alkenes: cyclohexene 127.3 and cyclopentene 130.8 (from memory, Pretsch et al. 2009) lie 3.3 and 1.3 ppm
/// below the open-chain sum; those are the ring corrections. Allenes (from memory): central carbon 200–215, terminal
/// carbons: =CH2 74–80, =CHR 88–100, =CR2 98–115.
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
        AlkeneCorrections.Steric(estimate, own, other);
        var inRing = AddRing(context, carbon, partner, estimate);
        var cisKnown = inRing || AlkeneCorrections.AddCis(context, carbon, partner, own, other, estimate);
        AlkeneCorrections.Polarisation(estimate, own, other, inRing);
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
        HasSecondDoubleBond(m, carbon, partner) ? new Tabulated(207.0, 9.0, "allene central carbon").ToPrediction()
        : (m.Degree(carbon) switch
        {
            1 => new Tabulated(77.5, 5.5, "allene =CH2"),
            2 => new Tabulated(94.0, 8.0, "allene =CHR"),
            _ => new Tabulated(105.0, 10.0, "allene =CR2"),
        }).ToPrediction();

    private static AlkeneSide AddSide(PredictionContext context, int atom, int across, CarbonEstimate estimate, bool ownSide)
    {
        var m = context.Molecule;
        var side = default(AlkeneSide);
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
                var (beta, gamma, _, most) = ChainWalk.CountWithBranching(context, atom, x);
                side.BranchedBeta |= most >= 2;
                AddAlkyl(estimate, ownSide, 1, 1);
                AddAlkyl(estimate, ownSide, 2, beta);
                AddAlkyl(estimate, ownSide, 3, gamma);
                AddBetaGroups(context, atom, x, estimate, ownSide, ref side);
                continue;
            }

            estimate.Add(ownSide ? AlkeneIncrements.OwnLabel(group) : AlkeneIncrements.OtherLabel(group),
                ownSide ? AlkeneIncrements.Own(group) : AlkeneIncrements.Other(group));
            side.Spread += AlkeneIncrements.Spread(group);
            if (group is Group.Acyl or Group.Formyl or Group.Ester or Group.CarboxylicAcid or Group.Amide or Group.Nitrile
                or Group.Nitro or Group.AcylHalide or Group.Sulfonyl or Group.Carboxylate)
            {
                side.Acceptor = true;
                side.AcceptorInRing |= context.Rings.BondInRing[m.BondBetween(atom, x)];
                side.KetoneAcceptor |= group is Group.Acyl or Group.Formyl;
            }

            if (group == Group.Aryl && Aromatic.AromaticFacts.Of(context).IsFiveRingHeteroaryl(x))
            {
                // π-excessive heteroaryls (furyl, thienyl, indolyl) conjugate unlike phenyl, the row's parent.
                side.Spread += 3.0;
            }
        }

        return side;
    }

    /// <summary>
    /// Functional groups one bond beyond an alkyl substituent (allylic O, N, halogen, aryl, C=O): allyl alcohol
    /// 137.2/115.0, allylbenzene 137.4/115.8 against propene 133.9/115.9 (from memory).
    /// </summary>
    private static void AddBetaGroups(PredictionContext context, int atom, int alpha, CarbonEstimate estimate, bool ownSide, ref AlkeneSide side)
    {
        foreach (var y in context.Molecule.Neighbours(alpha))
        {
            if (y == atom || Topology.IsSp3Carbon(context, y))
            {
                continue;
            }

            estimate.Add(ownSide ? "β group" : "β′ group", ownSide ? 2.5 : -1.0);
            side.Spread += ownSide ? 1.5 : 1.0;
        }
    }

    private static void AddAlkyl(CarbonEstimate estimate, bool ownSide, int position, int times)
    {
        for (var i = 0; i < times; i++)
        {
            estimate.Add(ownSide ? AlkeneIncrements.OwnAlkylLabels[position] : AlkeneIncrements.OtherAlkylLabels[position],
                ownSide ? AlkeneIncrements.OwnAlkyl[position] : AlkeneIncrements.OtherAlkyl[position]);
        }
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
}
