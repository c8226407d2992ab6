using System.Collections.Immutable;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>
/// Adds the ortho/meta/para increments of every substituent on the ring to an estimate for one ring position and
/// reports what widens the window. In five-membered rings a substituent two positions away uses the meta row.
/// </summary>
internal static class RingSubstituents
{
    /// <summary>What the substituents of one ring did to the estimate.</summary>
    /// <param name="Count">Substituents with a table row.</param>
    /// <param name="SumAbsolute">Σ |Z| applied.</param>
    /// <param name="Uncertainty">Extra half-width: approximate rows, unknown groups, crowded neighbours.</param>
    public readonly record struct Outcome(int Count, double SumAbsolute, double Uncertainty);

    /// <summary>Applies the increments of substituents on <paramref name="ring"/> to position <paramref name="index"/>.</summary>
    public static Outcome Apply(PredictionContext context, ImmutableArray<int> ring, int index, ProtonEstimate estimate)
    {
        int count = 0, adjacentPairs = 0;
        double sum = 0, uncertainty = 0;
        var previousSubstituted = false;
        var firstSubstituted = false;
        for (var j = 0; j < ring.Length; j++)
        {
            var substituted = false;
            if (j != index)
            {
                foreach (var s in context.Molecule.Neighbours(ring[j]))
                {
                    if (!IsExocyclicSubstituent(context, ring, ring[j], s))
                    {
                        continue;
                    }

                    substituted = true;
                    var (z, extra) = Increment(context, ring, ring[j], s, AromaticRing.Distance(ring.Length, index, j), estimate);
                    count += extra < 0.3 ? 1 : 0;
                    sum += Math.Abs(z);
                    uncertainty += extra;
                }
            }

            adjacentPairs += substituted && previousSubstituted ? 1 : 0;
            firstSubstituted |= j == 0 && substituted;
            previousSubstituted = substituted;
        }

        adjacentPairs += previousSubstituted && firstSubstituted ? 1 : 0;
        return new Outcome(count, sum, uncertainty + Math.Min(0.15, 0.05 * adjacentPairs));
    }

    private static (double Z, double Extra) Increment(PredictionContext context, ImmutableArray<int> ring, int ringAtom, int substituent, int distance, ProtonEstimate estimate)
    {
        var kind = SubstituentClassifier.Classify(context, ringAtom, substituent);
        var row = BenzeneIncrements.Of(kind, context.Molecule.Atoms[substituent].HydrogenCount);
        var position = distance switch { 1 => "o-", 2 => "m-", _ => "p-" };
        if (row is null)
        {
            estimate.Note("no ring increment for " + position + SubstituentLabels.Of(kind));
            return (0, 0.3);
        }

        var z = row.Value.At(distance);
        estimate.Add(z, position, SubstituentLabels.Of(kind));
        return (z, row.Value.Uncertainty);
    }

    private static bool IsExocyclicSubstituent(PredictionContext context, ImmutableArray<int> ring, int ringAtom, int neighbour) =>
        !ring.Contains(neighbour)
        && context.Molecule.Atoms[ringAtom].AtomicNumber == 6
        && !context.IsAromaticBond(ringAtom, neighbour)
        && context.Molecule.Bonds[context.Molecule.BondBetween(ringAtom, neighbour)].Order == 1;
}
