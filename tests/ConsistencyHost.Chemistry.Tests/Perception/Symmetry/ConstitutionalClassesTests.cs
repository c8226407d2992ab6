using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

public sealed class ConstitutionalClassesTests
{
    [Fact]
    public void Of_C70_GivesFiveOrbitsOfTenTenTwentyTwentyTen()
    {
        // Source: nmr-methods.md §1.4 (C70 has five carbon orbits, 10:10:20:20:10; five 13C lines, common practice).
        var m = C70Cage.Build();
        Assert.Equal(70, m.AtomCount);
        Assert.All(Enumerable.Range(0, 70), v => Assert.Equal(3, m.Degree(v)));
        var classes = ConstitutionalClasses.Of(m);
        Assert.True(classes.IsExact);
        Assert.Equal([10, 10, 10, 20, 20], classes.Classes.Select(c => c.Length).Order());
    }

    [Theory]
    [InlineData("C12C3C4C3C2C5C4C15", new[] { 2, 2, 4 })] // cuneane, nmr-methods.md §1.4: orbits 2, 4, 2
    [InlineData("C12C3C4C1C5C2C3C45", new[] { 8 })] // cubane, one orbit (§1.9)
    [InlineData("C1C2CC3CC1CC(C2)C3", new[] { 4, 6 })] // adamantane: 4 CH, 6 CH2 (common practice)
    [InlineData("C1CCC1C1CCC1", new[] { 2, 2, 4 })] // bicyclobutyl: 2 CH, 4 alpha-CH2, 2 beta-CH2 (common practice)
    public void Of_SymmetricCage_GivesExactOrbitSizes(string smiles, int[] sizes)
    {
        var classes = ConstitutionalClasses.Of(SmilesReader.Read(smiles).Value!);
        Assert.Equal(sizes, classes.Classes.Select(c => c.Length).Order());
    }

    [Fact]
    public void Of_BothKekuleForms_GiveTheSameClasses()
    {
        // Common practice: 2-fluorotoluene written in either Kekulé form is one compound.
        var a = ConstitutionalClasses.Of(SmilesReader.Read("CC1=C(F)C=CC=C1").Value!);
        var b = ConstitutionalClasses.Of(SmilesReader.Read("CC1C(F)=CC=CC=1").Value!);
        Assert.Equal(a.Classes.Select(c => c.ToArray()), b.Classes.Select(c => c.ToArray()));
    }
}
