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
        Steric(estimate, own, other);
        var inRing = AddRing(context, carbon, partner, estimate);
        var cisKnown = inRing || AddCis(context, carbon, partner, own, other, estimate);
        Polarisation(estimate, own, other, inRing);
        estimate.Widen(2.0 + 0.5 * (own.Count + other.Count) + own.Spread + other.Spread + (inRing ? 1.5 : 0)
            + (own.Count == 1 && other.Count == 1 && !cisKnown ? 0.6 : 0));
        return estimate.Build(ShiftBasis.Increments, "substituents (increment error)", own.Count + other.Count);
    }

    /// <summary>
    /// A conjugated acceptor deshields the β carbon more when that carbon is substituted and much more inside an
    /// enone or unsaturated lactone ring; the α carbon in such a ring sits higher too. Parents (from memory): methyl
    /// crotonate 144.7, (E)-pent-3-en-2-one 143.0, mesityl oxide 155, cyclohex-2-enone 151.0/129.9, cyclopent-2-enone
    /// 165.2/134.6, 2(5H)-furanone 153.4/121.4 (β/α).
    /// </summary>
    private static void Polarisation(CarbonEstimate estimate, Side own, Side other, bool inRing)
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
    private static void AddBetaGroups(PredictionContext context, int atom, int alpha, CarbonEstimate estimate, bool ownSide, ref Side side)
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
        public bool Acceptor;
        public bool AcceptorInRing;
        public bool KetoneAcceptor;
        public double Spread;
    }
}
