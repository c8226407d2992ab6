using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

/// <summary>Property: classes do not depend on atom order (100 seeded random permutations per molecule).</summary>
public sealed class PermutationPropertyTests
{
    public static TheoryData<string> Molecules()
    {
        var data = new TheoryData<string>();
        foreach (var row in TopicityCases.Rows)
        {
            data.Add((string)row[1]);
        }

        data.Add("C12C3C4C3C2C5C4C15");
        data.Add("CC(O)CC(O)C");
        return data;
    }

    [Theory]
    [MemberData(nameof(Molecules))]
    public void Of_RandomAtomOrder_GivesSameClasses(string smiles)
    {
        var original = SmilesReader.Read(smiles).Value!;
        var expected = Signature(NmrEquivalence.Of(original), Enumerable.Range(0, original.AtomCount).ToArray());
        var random = new Random(20261202);
        for (var trial = 0; trial < 100; trial++)
        {
            var order = Enumerable.Range(0, original.AtomCount).ToArray();
            random.Shuffle(order);
            var permuted = Permute(original, order);
            Assert.Equal(expected, Signature(NmrEquivalence.Of(permuted), order));
        }
    }

    /// <summary>Classes as sorted strings of original atom indices; <paramref name="order"/>[i] = original index of atom i.</summary>
    private static string Signature(NmrEquivalence e, int[] order)
    {
        static string Join(IEnumerable<int> xs) => string.Join(',', xs.Order());
        var heavy = e.Constitutional.Classes.Select(c => Join(c.Select(i => order[i]))).Order(StringComparer.Ordinal);
        var carbon = e.CarbonClasses13C.Select(c => Join(c.Select(i => order[i]))).Order(StringComparer.Ordinal);
        var hydrogen = e.HydrogenClasses.Select(c => Join(c.ParentAtoms.Select(i => order[i]))).Order(StringComparer.Ordinal);
        return $"{string.Join('|', heavy)} / {string.Join('|', carbon)} / {string.Join('|', hydrogen)} / {e.Expected1H.Min}-{e.Expected1H.Max} / {e.Expected13C.Min}-{e.Expected13C.Max}";
    }

    /// <summary>New molecule whose atom i is original atom order[i], stereo carried along.</summary>
    internal static Molecule Permute(Molecule m, int[] order)
    {
        var position = new int[order.Length];
        for (var i = 0; i < order.Length; i++)
        {
            position[order[i]] = i;
        }

        var builder = new MoleculeBuilder();
        foreach (var original in order)
        {
            builder.AddAtom(m.Atoms[original]);
        }

        var bondIndex = new int[m.Bonds.Length];
        for (var i = 0; i < m.Bonds.Length; i++)
        {
            var b = m.Bonds[i];
            bondIndex[i] = builder.AddBond(b with { Begin = position[b.Begin], End = position[b.End] });
        }

        foreach (var t in m.TetrahedralStereo)
        {
            builder.AddTetrahedral(t with { Centre = position[t.Centre], Neighbours = [.. t.Neighbours.Select(n => n < 0 ? n : position[n])] });
        }

        foreach (var d in m.DoubleBondStereo)
        {
            builder.AddDoubleBond(d with { Bond = bondIndex[d.Bond], BeginReference = position[d.BeginReference], EndReference = position[d.EndReference] });
        }

        return builder.Build();
    }
}
