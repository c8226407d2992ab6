using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>Neighbourhood questions for sp3 C–H windows that the increments do not see.</summary>
internal static class NearbyRings
{
    /// <summary>True when an aromatic atom lies within <paramref name="maxBonds"/> bonds (beyond the first when
    /// <paramref name="skipAlpha"/>): its ring current can shield the protons (ethyl esters of ortho-crowded
    /// benzoates, CH3 at 1.0 instead of 1.3).</summary>
    public static bool HasAromaticWithin(PredictionContext context, int atom, int maxBonds, bool skipAlpha)
    {
        var n = context.Molecule.AtomCount;
        Span<int> distance = n <= 512 ? stackalloc int[n] : new int[n];
        Span<int> queue = n <= 512 ? stackalloc int[n] : new int[n];
        distance.Fill(-1);
        distance[atom] = 0;
        int head = 0, tail = 0;
        queue[tail++] = atom;
        while (head < tail)
        {
            var current = queue[head++];
            if (distance[current] == maxBonds) continue;
            foreach (var next in context.Molecule.Neighbours(current))
            {
                if (distance[next] >= 0) continue;
                distance[next] = distance[current] + 1;
                if (context.IsAromatic(next) && !(skipAlpha && distance[next] == 1)) return true;
                queue[tail++] = next;
            }
        }

        return false;
    }

    /// <summary>True when the carbon is bonded to a ring nitrogen of an amide, carbamate or urea in the same ring.</summary>
    public static bool IsNextToRingAmideNitrogen(PredictionContext context, int carbon)
    {
        foreach (var n in context.Molecule.Neighbours(carbon))
        {
            if (context.Molecule.Atoms[n].AtomicNumber == 7 && context.Rings.AtomInRing[n]
                && SubstituentClassifier.Classify(context, carbon, n) is Substituent.AmideNitrogen or Substituent.SulfonamideNitrogen)
            {
                return true;
            }
        }

        return false;
    }
}
