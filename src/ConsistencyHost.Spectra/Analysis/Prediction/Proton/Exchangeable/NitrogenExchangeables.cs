using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Exchangeable;

/// <summary>Classifies N–H protons.</summary>
internal static class NitrogenExchangeables
{
    /// <summary>The class for H on nitrogen <paramref name="atom"/>.</summary>
    public static ExchangeableKind Classify(PredictionContext context, int atom)
    {
        var m = context.Molecule;
        var a = m.Atoms[atom];
        if (context.IsAromatic(atom))
        {
            return a.Charge > 0 ? ExchangeableKind.AromaticCationNH : AromaticNitrogen(context, atom);
        }

        if (a.Charge > 0 || m.Degree(atom) + a.HydrogenCount >= 4)
        {
            return ExchangeableKind.AmmoniumNH;
        }

        if (AtomFacts.DoubleBondsTo(context, atom, 6) + AtomFacts.DoubleBondsTo(context, atom, 7) > 0)
        {
            return ExchangeableKind.AmidineNH;
        }

        return Acylated(context, atom) ?? Plain(context, atom);
    }

    private static ExchangeableKind AromaticNitrogen(PredictionContext context, int atom)
    {
        var ring = AromaticRing.Of(context, atom);
        bool lactam = ring.Length == 6, otherNitrogen = false;
        foreach (var r in ring)
        {
            lactam |= context.Molecule.Atoms[r].AtomicNumber == 6 && AromaticRing.HasExocyclicDoubleBond(context, ring, r);
            otherNitrogen |= r != atom && context.Molecule.Atoms[r].AtomicNumber == 7;
        }

        return lactam ? ExchangeableKind.AromaticLactamNH : otherNitrogen ? ExchangeableKind.AzoleNH : ExchangeableKind.PyrroleNH;
    }

    private static ExchangeableKind? Acylated(PredictionContext context, int atom)
    {
        var m = context.Molecule;
        int carbonyls = 0, sulfonyls = 0;
        var carbonyl = -1;
        bool thio = false, hydrazide = false;
        foreach (var n in m.Neighbours(atom))
        {
            var z = m.Atoms[n].AtomicNumber;
            if (z == 6 && AtomFacts.DoubleBondsTo(context, n, 8) > 0) { carbonyls++; carbonyl = n; }
            else if (z == 6 && AtomFacts.DoubleBondsTo(context, n, 16) > 0) thio = true;
            else if (z == 16 && AtomFacts.DoubleBondsTo(context, n, 8) >= 2) sulfonyls++;
            else if (z == 7) hydrazide = true;
        }

        if (carbonyls + sulfonyls >= 2) return ExchangeableKind.ImideNH;
        if (thio) return ExchangeableKind.ThioamideNH;
        var aryl = ExchangeableClassifier.IsOnAromatic(context, atom);
        if (sulfonyls == 1) return aryl ? ExchangeableKind.SulfonanilideNH : ExchangeableKind.SulfonamideNH;
        if (carbonyls == 0) return null;
        if (hydrazide) return ExchangeableKind.HydrazideNH;
        return CarbonylClass(context, atom, carbonyl, aryl);
    }

    private static ExchangeableKind CarbonylClass(PredictionContext context, int atom, int carbonyl, bool aryl)
    {
        var m = context.Molecule;
        foreach (var n in m.Neighbours(carbonyl))
        {
            if (n == atom || m.Bonds[m.BondBetween(carbonyl, n)].Order != 1) continue;
            switch (m.Atoms[n].AtomicNumber)
            {
                case 8: return aryl ? ExchangeableKind.ArylCarbamateNH : ExchangeableKind.CarbamateNH;
                case 7: return aryl ? ExchangeableKind.ArylUreaNH : ExchangeableKind.UreaNH;
            }
        }

        if (m.Atoms[atom].HydrogenCount >= 2) return ExchangeableKind.PrimaryAmideNH;
        return aryl ? ExchangeableKind.AnilideNH : ExchangeableKind.AmideNH;
    }

    private static ExchangeableKind Plain(PredictionContext context, int atom)
    {
        var m = context.Molecule;
        int aryls = 0, heteroaryls = 0;
        bool chelated = false, nitrogen = false, amidine = false, vinyl = false;
        foreach (var n in m.Neighbours(atom))
        {
            var z = m.Atoms[n].AtomicNumber;
            nitrogen |= z == 7;
            amidine |= z == 6 && AtomFacts.DoubleBondsTo(context, n, 7) > 0 && !context.IsAromatic(n);
            if (context.IsAromatic(n))
            {
                aryls++;
                heteroaryls += IsHeteroaromaticAtom(context, n) ? 1 : 0;
                chelated |= Chelation.HasAcceptorNextTo(context, n);
            }
            else if (z == 6 && AtomFacts.DoubleBondsTo(context, n, 6) > 0)
            {
                vinyl = true;
                chelated |= Chelation.HasAcceptorNextTo(context, n);
            }
        }

        if (nitrogen) return ExchangeableKind.HydrazineNH;
        if (amidine) return ExchangeableKind.AmidineNH;
        if (chelated) return ExchangeableKind.ChelatedNH;
        if (aryls >= 2) return ExchangeableKind.DiarylAmineNH;
        if (heteroaryls == 1) return ExchangeableKind.HeteroarylAmineNH;
        if (aryls == 1) return ExchangeableKind.ArylAmineNH;
        return vinyl ? ExchangeableKind.AmidineNH : ExchangeableKind.AmineNH;
    }

    private static bool IsHeteroaromaticAtom(PredictionContext context, int atom)
    {
        foreach (var r in AromaticRing.Of(context, atom))
        {
            if (context.Molecule.Atoms[r].AtomicNumber != 6) return true;
        }

        return false;
    }
}
