using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Tests.TestSupport;

/// <summary>Compares two molecules under a known atom correspondence.</summary>
internal static class GraphAssert
{
    /// <summary>Null when equal; otherwise what differs. <paramref name="order"/>[i] is the original index of copy atom i.</summary>
    public static string? Difference(Molecule original, Molecule copy, IReadOnlyList<int> order)
    {
        if (original.AtomCount != copy.AtomCount || original.Bonds.Length != copy.Bonds.Length)
        {
            return $"size {original.AtomCount}/{original.Bonds.Length} vs {copy.AtomCount}/{copy.Bonds.Length}";
        }

        for (var i = 0; i < copy.AtomCount; i++)
        {
            var a = original.Atoms[order[i]];
            var b = copy.Atoms[i];
            if ((a.AtomicNumber, a.Charge, a.Isotope, a.HydrogenCount, a.Radical) != (b.AtomicNumber, b.Charge, b.Isotope, b.HydrogenCount, b.Radical))
            {
                return $"atom {order[i]}: {a} vs {b}";
            }
        }

        foreach (var b in copy.Bonds)
        {
            var k = original.BondBetween(order[b.Begin], order[b.End]);
            if (k < 0 || original.Bonds[k].Order != b.Order)
            {
                return $"bond {order[b.Begin]}-{order[b.End]}";
            }
        }

        return StereoDifference(original, copy, order);
    }

    private static string? StereoDifference(Molecule original, Molecule copy, IReadOnlyList<int> order)
    {
        if (original.TetrahedralStereo.Length != copy.TetrahedralStereo.Length)
        {
            return $"tetrahedral count {original.TetrahedralStereo.Length} vs {copy.TetrahedralStereo.Length}";
        }

        foreach (var t in copy.TetrahedralStereo)
        {
            var mapped = t with { Centre = order[t.Centre], Neighbours = [.. t.Neighbours.Select(n => n < 0 ? n : order[n])] };
            var expected = original.TetrahedralStereo.Single(x => x.Centre == mapped.Centre);
            StereoAssert.SameTetrahedral(expected, mapped);
        }

        foreach (var d in copy.DoubleBondStereo)
        {
            var bond = copy.Bonds[d.Bond];
            var k = original.BondBetween(order[bond.Begin], order[bond.End]);
            var expected = original.DoubleBondStereo.SingleOrDefault(x => x.Bond == k);
            if (expected is null)
            {
                return $"double bond {k} gained a configuration";
            }

            var ob = original.Bonds[k];
            var (refBegin, refEnd) = ob.Begin == order[bond.Begin] ? (order[d.BeginReference], order[d.EndReference]) : (order[d.EndReference], order[d.BeginReference]);
            if (StereoAssert.ConfigurationFor(original, expected, refBegin, refEnd) != d.Configuration)
            {
                return $"double bond {k} configuration";
            }
        }

        return original.DoubleBondStereo.Length == copy.DoubleBondStereo.Length ? null : "double-bond stereo count";
    }

    public static ImmutableArray<int> Identity(int n) => [.. Enumerable.Range(0, n)];
}
