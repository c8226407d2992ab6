using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Base values for aromatic carbons whose ring system matches no template: aza increments in six-membered rings,
/// neighbour-based values in five-membered rings, and ring carbonyls by their ring neighbours. Wide on purpose.
/// </summary>
/// <remarks>
/// Aza increments from pyridine against benzene (Gottlieb 1997 / Fulmer 2010 pyridine 149.90/123.75/135.96 less
/// 128.5): α +21.4, β −4.7, γ +7.5; a second α-N costs −12.8 (pyrimidine C-2 158.7 against 171.3 summed; from
/// memory). Ring-fusion carbons +5 (naphthalene C-4a 133.6). Five-membered rings from furan, pyrrole, thiophene and
/// the azoles (from memory, Pretsch et al. 2009): next to O 140–158, next to N 115–155, neither 100–128. Ring
/// carbonyls (pyridones, pyrimidinones, purine-diones, pyranones; from memory): N–C(=O)–N 150–156, N–C(=O)–C
/// 155–166, O–C(=O)–C 158–163, C–C(=O)–C 172–182.
/// </remarks>
internal static class LocalAromaticRules
{
    /// <summary>A wide base value for aromatic carbon <paramref name="carbon"/>.</summary>
    public static Tabulated Estimate(PredictionContext context, int carbon)
    {
        var m = context.Molecule;
        if (Topology.IsCarbonylCarbon(m, carbon))
        {
            return RingCarbonyl(context, carbon);
        }

        var facts = RingFacts.Of(context);
        return facts.SmallestSize[carbon] switch
        {
            6 => SixRing(context, carbon, facts),
            5 => FiveRing(context, carbon),
            _ => new(130.0, 20.0, "aromatic carbon (unusual ring)"),
        };
    }

    private static Tabulated SixRing(PredictionContext context, int carbon, RingFacts facts)
    {
        var ring = context.Rings.Rings[facts.SmallestRingIndex[carbon]];
        var at = ring.IndexOf(carbon);
        var ppm = 128.5;
        var hetero = 0;
        var alphaNitrogens = 0;
        for (var k = 0; k < ring.Length; k++)
        {
            var z = context.Molecule.Atoms[ring[k]].AtomicNumber;
            if (z == Topology.Carbon)
            {
                continue;
            }

            hetero++;
            var d = Math.Min(Math.Abs(k - at), ring.Length - Math.Abs(k - at));
            ppm += d switch { 1 => 21.4, 2 => -4.7, _ => 7.5 };
            alphaNitrogens += d == 1 ? 1 : 0;
        }

        ppm -= alphaNitrogens >= 2 ? 12.8 : 0;
        var fused = facts.RingCount[carbon] > 1;
        ppm += fused ? 5.0 : 0;
        return new(ppm, 5.0 + 2.0 * hetero + (fused ? 3.0 : 0), "aromatic C, aza increments (no template)");
    }

    private static Tabulated FiveRing(PredictionContext context, int carbon)
    {
        var m = context.Molecule;
        var nextToOxygen = false;
        var nextToNitrogen = false;
        var nextToSulfur = false;
        foreach (var x in m.Neighbours(carbon))
        {
            if (!context.IsAromatic(x))
            {
                continue;
            }

            var z = m.Atoms[x].AtomicNumber;
            nextToOxygen |= z == Topology.Oxygen;
            nextToNitrogen |= z == Topology.Nitrogen;
            nextToSulfur |= z == Topology.Sulfur;
        }

        return nextToOxygen ? new(149.0, 11.0, "5-ring C next to O (no template)")
            : nextToNitrogen ? new(135.0, 20.0, "5-ring C next to N (no template)")
            : nextToSulfur ? new(135.0, 14.0, "5-ring C next to S (no template)")
            : new(116.0, 16.0, "5-ring C (no template)");
    }

    private static Tabulated RingCarbonyl(PredictionContext context, int carbon)
    {
        var m = context.Molecule;
        int nitrogen = 0, oxygen = 0, carbonNeighbours = 0;
        foreach (var x in m.Neighbours(carbon))
        {
            if (!context.IsAromatic(x))
            {
                continue;
            }

            switch (m.Atoms[x].AtomicNumber)
            {
                case Topology.Nitrogen: nitrogen++; break;
                case Topology.Oxygen: oxygen++; break;
                case Topology.Carbon: carbonNeighbours++; break;
            }
        }

        return (nitrogen, oxygen, carbonNeighbours) switch
        {
            (2, _, _) => new(152.5, 5.0, "ring N–C(=O)–N"),
            (1, 1, _) => new(154.5, 5.0, "ring O–C(=O)–N"),
            (1, _, _) => new(160.5, 7.0, "ring N–C(=O)–C"),
            (_, 1, _) => new(160.5, 5.0, "ring O–C(=O)–C"),
            (_, _, 2) => new(177.0, 7.0, "ring C–C(=O)–C"),
            _ => new(165.0, 15.0, "ring C=X"),
        };
    }
}
