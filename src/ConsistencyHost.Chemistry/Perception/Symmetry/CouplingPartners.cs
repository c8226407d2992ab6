using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Rings;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Coupling partners of each hydrogen class from the bond graph.</summary>
/// <remarks>2J: other classes on the same atom; 3J: classes on bonded atoms; 4J: classes two atoms away when the
/// path contains a double or aromatic bond (allylic, aromatic meta). W couplings in saturated rings are not
/// listed. Heteronuclear: 19F and 31P within three bonds of the hydrogen (1J for P–H included).
/// Common practice (e.g. Pretsch, Structure Determination of Organic Compounds, coupling-constant tables).</remarks>
internal static class CouplingPartners
{
    public static ImmutableArray<HydrogenClass> Attach(Molecule m, Aromaticity aromaticity, List<HydrogenClass> classes)
    {
        var onAtom = new List<int>[m.AtomCount];
        foreach (var c in classes)
        {
            foreach (var p in c.ParentAtoms.Distinct())
            {
                (onAtom[p] ??= []).Add(c.Index);
            }
        }

        var result = ImmutableArray.CreateBuilder<HydrogenClass>(classes.Count);
        foreach (var c in classes)
        {
            result.Add(WithPartners(m, aromaticity, c, onAtom));
        }

        return result.MoveToImmutable();
    }

    private static HydrogenClass WithPartners(Molecule m, Aromaticity aromaticity, HydrogenClass c, List<int>[] onAtom)
    {
        var two = new SortedSet<int>();
        var three = new SortedSet<int>();
        var four = new SortedSet<int>();
        var hetero = new SortedSet<int>();
        foreach (var p in c.ParentAtoms.Distinct())
        {
            Add(two, onAtom[p], c.Index);
            AddHetero(m, hetero, p);
            var n1 = m.Neighbours(p);
            var b1 = m.BondsOf(p);
            for (var i = 0; i < n1.Length; i++)
            {
                var q = n1[i];
                Add(three, onAtom[q], c.Index);
                AddHetero(m, hetero, q);
                var n2 = m.Neighbours(q);
                var b2 = m.BondsOf(q);
                for (var j = 0; j < n2.Length; j++)
                {
                    var r = n2[j];
                    if (r == p)
                    {
                        continue;
                    }

                    AddHetero(m, hetero, r);
                    if (IsUnsaturated(m, aromaticity, b1[i]) || IsUnsaturated(m, aromaticity, b2[j]))
                    {
                        Add(four, onAtom[r], c.Index);
                    }
                }
            }
        }

        return c with { Geminal2J = [.. two], Vicinal3J = [.. three], LongRange4J = [.. four], HeteronuclearNeighbours = [.. hetero] };
    }

    private static bool IsUnsaturated(Molecule m, Aromaticity aromaticity, int bond) =>
        aromaticity.AromaticBonds[bond] || m.Bonds[bond].Order >= 2;

    private static void Add(SortedSet<int> set, List<int>? classes, int self)
    {
        if (classes is null)
        {
            return;
        }

        foreach (var x in classes)
        {
            if (x != self)
            {
                set.Add(x);
            }
        }
    }

    private static void AddHetero(Molecule m, SortedSet<int> set, int atom)
    {
        if (m.Atoms[atom].AtomicNumber is 9 or 15)
        {
            set.Add(atom);
        }
    }
}
