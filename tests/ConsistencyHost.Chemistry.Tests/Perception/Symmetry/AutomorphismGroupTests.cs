using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

/// <summary>The listed automorphism group: complete (known group orders), made of automorphisms only, and
/// refused when too large.</summary>
public sealed class AutomorphismGroupTests
{
    [Theory]
    [InlineData("c1ccccc1", 12)] // benzene: dihedral group of the hexagon, order 2·6 (common practice)
    [InlineData("c1ccc2ccccc2c1", 4)] // naphthalene: D2h acts on the graph as the Klein four-group (common practice)
    [InlineData("C12C3C4C1C5C2C3C45", 48)] // cubane: automorphisms of the 3-cube graph, 2^3·3! = 48 (common practice)
    [InlineData("C1C2CC3CC1CC(C2)C3", 24)] // adamantane: Td, order 24 (common practice)
    [InlineData("CC(C)(C)c1ccccc1", 12)] // tert-butylbenzene: 3! methyl permutations × ring flip (common practice)
    public void TryList_SymmetricMolecule_ListsEveryAutomorphismOnce(string smiles, int order)
    {
        var molecule = SmilesReader.Read(smiles).Value!;
        var group = AutomorphismGroup.TryList(SymmetryContext.Create(molecule));
        Assert.NotNull(group);
        Assert.Equal(order, group.Elements.Count);
        Assert.Equal(order, group.Elements.Select(e => string.Join(',', e)).Distinct(StringComparer.Ordinal).Count());
        Assert.All(group.Elements, sigma => AssertAutomorphism(molecule, sigma));
    }

    [Fact]
    public void TryList_TetraTertButylmethane_RefusesTheLargeGroupWithoutMarkingResultsInexact()
    {
        // (3!)^4 methyl permutations × 4! permutations of the tert-butyl groups = 31,104 automorphisms (common practice).
        var molecule = SmilesReader.Read("CC(C)(C)C(C(C)(C)C)(C(C)(C)C)C(C)(C)C").Value!;
        var ctx = SymmetryContext.Create(molecule);
        Assert.Null(AutomorphismGroup.TryList(ctx));
        Assert.False(ctx.Search.BudgetExceeded);
        var e = NmrEquivalence.Of(molecule);
        Assert.True(e.IsExact);
        // Common practice: all 36 methyl H are homotopic, one 1H signal; 13C shows the methyl, the tert-butyl C and the centre.
        Assert.Equal((1, 1), (e.Expected1H.Min, e.Expected1H.Max));
        Assert.Equal((3, 3), (e.Expected13C.Min, e.Expected13C.Max));
    }

    private static void AssertAutomorphism(Molecule m, int[] sigma)
    {
        Assert.Equal(m.AtomCount, sigma.Distinct().Count());
        foreach (var bond in m.Bonds)
        {
            var image = m.BondBetween(sigma[bond.Begin], sigma[bond.End]);
            Assert.True(image >= 0, $"bond {bond.Begin}-{bond.End} has no image");
        }

        for (var v = 0; v < m.AtomCount; v++)
        {
            Assert.Equal(m.Atoms[v].AtomicNumber, m.Atoms[sigma[v]].AtomicNumber);
            Assert.Equal(m.Atoms[v].HydrogenCount, m.Atoms[sigma[v]].HydrogenCount);
        }
    }
}
