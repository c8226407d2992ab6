namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>Ring membership of one atom from the shared ring set.</summary>
internal static class RingFacts
{
    /// <summary>The smallest ring holding <paramref name="atom"/> (0 when none), whether a ring oxygen is bonded to it
    /// in that ring, and how many rings hold it.</summary>
    public static (int Size, bool RingOxygenNext, int Rings) SmallestRing(PredictionContext context, int atom)
    {
        var best = 0;
        var count = 0;
        var oxygen = false;
        foreach (var ring in context.Rings.Rings)
        {
            var at = ring.IndexOf(atom);
            if (at < 0)
            {
                continue;
            }

            count++;
            if (best == 0 || ring.Length < best)
            {
                best = ring.Length;
                oxygen = IsOxygen(context, ring[(at + 1) % ring.Length]) || IsOxygen(context, ring[(at + ring.Length - 1) % ring.Length]);
            }
        }

        return (best, oxygen, count);
    }

    private static bool IsOxygen(PredictionContext context, int atom) => context.Molecule.Atoms[atom].AtomicNumber == 8;
}
