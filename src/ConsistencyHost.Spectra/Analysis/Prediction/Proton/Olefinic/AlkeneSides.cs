using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Olefinic;

/// <summary>
/// Whether two substituents on the two carbons of a double bond are on the same side: from a ring of up to seven
/// atoms holding the bond (its ring bonds are cis), else from the molecule's double-bond stereo, else unknown.
/// </summary>
internal static class AlkeneSides
{
    /// <summary>True (cis), false (trans) or null (not specified) for <paramref name="onFirst"/> on
    /// <paramref name="first"/> and <paramref name="onSecond"/> on <paramref name="second"/>.</summary>
    public static bool? SameSide(PredictionContext context, int first, int second, int onFirst, int onSecond)
    {
        var fromRing = FromRing(context, first, second, onFirst, onSecond);
        if (fromRing is not null)
        {
            return fromRing;
        }

        var m = context.Molecule;
        var bond = m.BondBetween(first, second);
        foreach (var stereo in m.DoubleBondStereo)
        {
            if (stereo.Bond == bond)
            {
                return FromStereo(m, stereo, first, onFirst, onSecond);
            }
        }

        return null;
    }

    private static bool? FromStereo(Molecule m, DoubleBondStereo stereo, int first, int onFirst, int onSecond)
    {
        var bond = m.Bonds[stereo.Bond];
        var referenceFirst = bond.Begin == first ? stereo.BeginReference : stereo.EndReference;
        var referenceSecond = bond.Begin == first ? stereo.EndReference : stereo.BeginReference;
        var cis = stereo.Configuration == DoubleBondConfiguration.Cis;
        // A substituent other than the reference sits on the reference's opposite side.
        if (referenceFirst != onFirst) cis = !cis;
        if (referenceSecond != onSecond) cis = !cis;
        return cis;
    }

    private static bool? FromRing(PredictionContext context, int first, int second, int onFirst, int onSecond)
    {
        foreach (var ring in context.Rings.Rings)
        {
            if (ring.Length > 7 || !ring.Contains(first) || !ring.Contains(second))
            {
                continue;
            }

            var firstInRing = ring.Contains(onFirst);
            var secondInRing = ring.Contains(onSecond);
            if (firstInRing || secondInRing)
            {
                // Ring neighbours of a small-ring double bond are cis; an exocyclic group is trans to the other ring neighbour.
                return firstInRing == secondInRing;
            }
        }

        return null;
    }
}
