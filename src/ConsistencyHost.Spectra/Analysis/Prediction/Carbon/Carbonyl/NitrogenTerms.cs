using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>Terms for a carbamate or urea nitrogen (sources in <see cref="HeteroCarbonyls"/>).</summary>
internal static class NitrogenTerms
{
    /// <summary>Adds the terms of <paramref name="nitrogen"/>; returns its number of non-H substituents besides the carbonyl.</summary>
    public static int Add(PredictionContext context, int carbonyl, int nitrogen, CarbonEstimate estimate, bool urea)
    {
        var m = context.Molecule;
        if (context.IsAromatic(nitrogen))
        {
            estimate.Add("N on aromatic ring", urea ? -8.0 : -7.5);
            estimate.Widen(2.0);
            return 2;
        }

        int substituents = 0, aryl = 0, acyl = 0, sulfonyl = 0;
        foreach (var x in m.Neighbours(nitrogen))
        {
            if (x == carbonyl)
            {
                continue;
            }

            substituents++;
            aryl += context.IsAromatic(x) ? 1 : 0;
            acyl += Topology.IsCarbonylCarbon(m, x) ? 1 : 0;
            sulfonyl += m.Atoms[x].AtomicNumber == Topology.Sulfur ? 1 : 0;
        }

        if (aryl > 0)
        {
            estimate.Add("N-aryl", urea ? -2.8 : substituents >= 2 ? -2.0 : -3.2);
        }
        else if (!urea && substituents >= 2 && acyl == 0 && sulfonyl == 0)
        {
            estimate.Add("N,N-dialkyl", -1.2);
        }

        if (acyl > 0)
        {
            estimate.Add("N-acyl", urea ? -4.0 : -4.5);
            estimate.Widen(1.5);
        }

        if (sulfonyl > 0)
        {
            estimate.Add("N-sulfonyl", -6.0);
            estimate.Widen(2.0);
        }

        return substituents;
    }
}
