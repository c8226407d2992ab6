using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>The heteroatoms on one sp3 carbon, by element, and its one non-hetero neighbour if any.</summary>
internal readonly record struct HeteroCount(int F, int Cl, int Br, int I, int O, int N, int S, int Other, int FirstCarbon)
{
    /// <summary>All heteroatom neighbours.</summary>
    public int Total => F + Cl + Br + I + O + N + S + Other;

    /// <summary>Chlorine, bromine and iodine.</summary>
    public int HeavyHalogens => Cl + Br + I;

    /// <summary>Counts the neighbours of <paramref name="carbon"/>.</summary>
    public static HeteroCount Of(PredictionContext context, int carbon)
    {
        int f = 0, cl = 0, br = 0, i = 0, o = 0, n = 0, s = 0, other = 0, firstCarbon = -1;
        foreach (var x in context.Molecule.Neighbours(carbon))
        {
            switch (context.Molecule.Atoms[x].AtomicNumber)
            {
                case 9: f++; break;
                case 17: cl++; break;
                case 35: br++; break;
                case 53: i++; break;
                case Topology.Oxygen: o++; break;
                case Topology.Nitrogen: n++; break;
                case Topology.Sulfur: s++; break;
                case Topology.Carbon: firstCarbon = firstCarbon < 0 ? x : firstCarbon; break;
                default: other++; break;
            }
        }

        return new HeteroCount(f, cl, br, i, o, n, s, other, firstCarbon);
    }
}
