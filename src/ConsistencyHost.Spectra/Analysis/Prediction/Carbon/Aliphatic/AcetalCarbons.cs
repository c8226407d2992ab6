using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>Carbons bearing exactly two oxygens: formaldehyde acetals, aldehyde acetals and ketals (sources in
/// <see cref="PolyheteroCarbons"/>).</summary>
internal static class AcetalCarbons
{
    /// <summary>The tabulated window for an O–C–O carbon with <paramref name="hydrogens"/> hydrogens.</summary>
    public static Tabulated Lookup(PredictionContext context, int carbon, int hydrogens)
    {
        var (aryl, acyl, hydroxy) = OxygenKinds(context, carbon);
        if (acyl > 0)
        {
            return hydrogens >= 2 ? new(80.5, 4.5, "acyloxymethyl O–CH2–O") : new(90.0, 6.0, "acylal O–CH–O");
        }

        var (ringSize, oxygensInRing) = Ring(context, carbon);
        if (hydrogens >= 2)
        {
            return aryl == 2 ? new(101.3, 1.8, "aryl O–CH2–O (methylenedioxy)") : new(95.5, 3.5, "O–CH2–O");
        }

        var estimate = hydrogens == 1 ? Aldehyde(ringSize, oxygensInRing) : Ketone(ringSize, oxygensInRing);
        return hydroxy > 0 ? estimate with { Ppm = estimate.Ppm - 4.0, HalfWidth = estimate.HalfWidth + 2.0, Label = "hemiacetal" } : estimate;
    }

    private static Tabulated Aldehyde(int ringSize, int oxygensInRing) => (ringSize, oxygensInRing) switch
    {
        (5, 2) => new(103.8, 2.5, "1,3-dioxolane O–CH–O"),
        (6, 2) => new(101.0, 3.0, "1,3-dioxane O–CH–O"),
        (6, 1) => new(99.5, 5.5, "pyranose/THP O–CH–O"),
        (5, 1) => new(104.5, 5.5, "furanose O–CH–O"),
        _ => new(102.5, 4.5, "acetal O–CH–O"),
    };

    private static Tabulated Ketone(int ringSize, int oxygensInRing) => (ringSize, oxygensInRing) switch
    {
        (5, 2) => new(109.5, 3.0, "1,3-dioxolane ketal"),
        (6, 2) => new(99.3, 3.0, "1,3-dioxane ketal"),
        (_, 1) => new(103.0, 7.5, "cyclic ketal (one ring O)"),
        _ => new(101.0, 4.5, "ketal"),
    };

    private static (int Aryl, int Acyl, int Hydroxy) OxygenKinds(PredictionContext context, int carbon)
    {
        int aryl = 0, acyl = 0, hydroxy = 0;
        foreach (var o in context.Molecule.Neighbours(carbon))
        {
            switch (GroupClassifier.Classify(context, carbon, o))
            {
                case Group.Aryloxy: aryl++; break;
                case Group.Acyloxy: acyl++; break;
                case Group.Hydroxy: hydroxy++; break;
            }
        }

        return (aryl, acyl, hydroxy);
    }

    /// <summary>The carbon's smallest ring and how many of its own oxygens lie in that ring.</summary>
    private static (int Size, int Oxygens) Ring(PredictionContext context, int carbon)
    {
        var facts = RingFacts.Of(context);
        var index = facts.SmallestRingIndex[carbon];
        if (index < 0)
        {
            return (0, 0);
        }

        var ring = context.Rings.Rings[index];
        var oxygens = 0;
        foreach (var o in context.Molecule.Neighbours(carbon))
        {
            if (context.Molecule.Atoms[o].AtomicNumber == Topology.Oxygen && ring.Contains(o))
            {
                oxygens++;
            }
        }

        return (ring.Length, oxygens);
    }
}
