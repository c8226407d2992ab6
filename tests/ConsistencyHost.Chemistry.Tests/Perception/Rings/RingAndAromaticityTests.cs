using ConsistencyHost.Chemistry.Perception.Rings;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Rings;

/// <summary>SSSR sizes (cyclomatic number m − n + c) and Hückel aromaticity of textbook rings (common practice).</summary>
public sealed class RingAndAromaticityTests
{
    [Theory]
    [InlineData("c1ccc2ccccc2c1", new[] { 6, 6 })] // naphthalene
    [InlineData("C12C3C4C1C5C2C3C45", new[] { 4, 4, 4, 4, 4 })] // cubane: 12 − 8 + 1 = 5 four-rings
    [InlineData("C1CC2CCC1C2", new[] { 5, 5 })] // norbornane
    [InlineData("C1CC1.C1CCC1", new[] { 3, 4 })] // two components
    public void Of_RingSystem_GivesSmallestRings(string smiles, int[] sizes)
    {
        var rings = RingSet.Of(SmilesReader.Read(smiles).Value!);
        Assert.Equal(sizes, rings.Rings.Select(r => r.Length).Order());
    }

    [Theory]
    [InlineData("C1=CC=CC=C1", true)] // benzene, Kekulé input
    [InlineData("O=C1C=CC=CN1", true)] // 2-pyridone: exocyclic C=O gives 0, NH gives 2
    [InlineData("C1=CC=CO1", true)] // furan
    [InlineData("C1=CC=CC1", false)] // cyclopentadiene: sp3 CH2
    [InlineData("O=C1C=CC(=O)C=C1", false)] // 1,4-benzoquinone: four π electrons in the ring
    [InlineData("C1=CC=C2C=CC=C2C=C1", true)] // azulene: 10 π electrons over the fused pair
    [InlineData("C1=CC=CC=CC=C1", false)] // cyclooctatetraene: 8 π electrons
    public void Of_Ring_FollowsHuckel(string smiles, bool aromatic)
    {
        var m = SmilesReader.Read(smiles).Value!;
        var result = Aromaticity.Of(m, RingSet.Of(m));
        Assert.Equal(aromatic, result.AromaticAtoms.Any(a => a));
    }
}
