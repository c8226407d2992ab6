using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>The (at most two) singly bonded neighbours of a carbonyl carbon, carbon sides first.</summary>
internal readonly record struct CarbonylNeighbours(int First, int Second, int Carbons)
{
    /// <summary>How many singly bonded neighbours (0–2).</summary>
    public int Count => (First >= 0 ? 1 : 0) + (Second >= 0 ? 1 : 0);

    /// <summary>The neighbours of <paramref name="carbon"/> other than <paramref name="oxo"/>.</summary>
    public static CarbonylNeighbours Of(PredictionContext context, int carbon, int oxo)
    {
        int first = -1, second = -1, carbons = 0;
        foreach (var x in context.Molecule.Neighbours(carbon))
        {
            if (x == oxo)
            {
                continue;
            }

            var isCarbon = context.Molecule.Atoms[x].AtomicNumber == Topology.Carbon;
            carbons += isCarbon ? 1 : 0;
            if (first < 0)
            {
                first = x;
            }
            else if (isCarbon && context.Molecule.Atoms[first].AtomicNumber != Topology.Carbon)
            {
                second = first;
                first = x;
            }
            else
            {
                second = x;
            }
        }

        return new CarbonylNeighbours(first, second, carbons);
    }
}
