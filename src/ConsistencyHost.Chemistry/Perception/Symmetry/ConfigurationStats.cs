using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Signal counts of one configuration and how many of them could coincide.</summary>
/// <param name="Symmetry">The configuration's orbits and split CH2 groups.</param>
/// <param name="HydrogenClassCount">Number of H classes.</param>
/// <param name="CarbonClassCount">Number of carbon classes.</param>
/// <param name="ExchangeableClasses">H classes on O, N or S.</param>
/// <param name="DiastereotopicPairs">CH2 / =CH2 groups whose two H form two classes.</param>
/// <param name="DiastereotopicHydrogenGroups">Extra H classes from heavy atoms that are constitutionally but not
/// stereochemically equivalent (e.g. the two methyls of an isopropyl next to a stereocentre).</param>
/// <param name="DiastereotopicCarbons">Extra carbon classes of the same kind.</param>
internal sealed record ConfigurationStats(
    ConfigurationSymmetry Symmetry,
    int HydrogenClassCount,
    int CarbonClassCount,
    int ExchangeableClasses,
    int DiastereotopicPairs,
    int DiastereotopicHydrogenGroups,
    int DiastereotopicCarbons)
{
    public static ConfigurationStats Of(Molecule m, ConfigurationSymmetry s, int[] constitutional)
    {
        int h = 0, c = 0, exchangeable = 0, pairs = 0;
        var stereoOrbitsPerConstitutional = new Dictionary<int, (int H, int C)>();
        for (var v = 0; v < m.AtomCount; v++)
        {
            if (s.Orbit[v] != v)
            {
                continue;
            }

            var atom = m.Atoms[v];
            var isCarbon = atom.AtomicNumber == 6;
            c += isCarbon ? 1 : 0;
            var hClasses = atom.HydrogenCount == 0 ? 0 : s.SplitHydrogens[v] ? 2 : 1;
            h += hClasses;
            pairs += s.SplitHydrogens[v] ? 1 : 0;
            exchangeable += IsExchangeableParent(atom) ? hClasses : 0;
            // Exchangeable classes are already allowed to vanish; count coinciding diastereotopic groups once.
            var key = constitutional[v];
            var (kh, kc) = stereoOrbitsPerConstitutional.GetValueOrDefault(key);
            var countsForH = hClasses > 0 && !IsExchangeableParent(atom);
            stereoOrbitsPerConstitutional[key] = (kh + (countsForH ? 1 : 0), kc + (isCarbon ? 1 : 0));
        }

        var extraH = stereoOrbitsPerConstitutional.Values.Sum(x => Math.Max(0, x.H - 1));
        var extraC = stereoOrbitsPerConstitutional.Values.Sum(x => Math.Max(0, x.C - 1));
        return new ConfigurationStats(s, h, c, exchangeable, pairs, extraH, extraC);
    }

    public static bool IsExchangeableParent(Atom atom) => atom.AtomicNumber is 7 or 8 or 16;
}
