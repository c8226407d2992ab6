using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Smiles;

/// <summary>Data table: SMILES → expected hydrogen counts, charges and number of double/triple bonds.</summary>
/// <remarks>Expected values follow the OpenSMILES specification (opensmiles.org: organic-subset default valences,
/// bracket atoms, aromaticity and kekulisation) and textbook structures (common practice).</remarks>
public sealed class SmilesReaderGraphTests
{
    public static TheoryData<string, int[], int[], int, int> Rows => new()
    {
        // SMILES, H per atom, charge per atom, double bonds, triple bonds
        { "c1ccccc1", [1, 1, 1, 1, 1, 1], [0, 0, 0, 0, 0, 0], 3, 0 },
        { "c1cc[nH]c1", [1, 1, 1, 1, 1], [0, 0, 0, 0, 0], 2, 0 },
        { "Cn1cccc1", [3, 0, 1, 1, 1, 1], [0, 0, 0, 0, 0, 0], 2, 0 },
        { "c1ccncc1", [1, 1, 1, 0, 1, 1], [0, 0, 0, 0, 0, 0], 3, 0 },
        { "o1cccc1", [0, 1, 1, 1, 1], [0, 0, 0, 0, 0], 2, 0 },
        { "c1cc[cH-]c1", [1, 1, 1, 1, 1], [0, 0, 0, -1, 0], 2, 0 },
        { "C[n+]1ccccc1", [3, 0, 1, 1, 1, 1, 1], [0, 1, 0, 0, 0, 0, 0], 3, 0 },
        { "[O-][n+]1ccccc1", [0, 0, 1, 1, 1, 1, 1], [-1, 1, 0, 0, 0, 0, 0], 3, 0 },
        { "c1ccc2ccccc2c1", [1, 1, 1, 0, 1, 1, 1, 1, 0, 1], [0, 0, 0, 0, 0, 0, 0, 0, 0, 0], 5, 0 },
        { "O=c1cc[nH]cc1", [0, 0, 1, 1, 1, 1, 1], [0, 0, 0, 0, 0, 0, 0], 3, 0 },
        { "[NH4+]", [4], [1], 0, 0 },
        { "CC(=O)[O-]", [3, 0, 0, 0], [0, 0, 0, -1], 1, 0 },
        { "C#N", [1, 0], [0, 0], 0, 1 },
        { "OS(=O)(=O)O", [1, 0, 0, 0, 1], [0, 0, 0, 0, 0], 2, 0 },
        { "C%10CC%10", [2, 2, 2], [0, 0, 0], 0, 0 },
        { "[H]C([H])(Cl)Cl", [2, 0, 0], [0, 0, 0], 0, 0 },
        { "[2H]C([2H])([2H])Cl", [0, 0, 0, 0, 0], [0, 0, 0, 0, 0], 0, 0 },
        { "C=C.[Na+]", [2, 2, 0], [0, 0, 1], 1, 0 },
        { "N(=O)=O", [1, 0, 0], [0, 0, 0], 2, 0 }, // valence 5 leaves one implicit H (OpenSMILES §3.5)
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_ValidSmiles_GivesExpectedGraph(string smiles, int[] hydrogens, int[] charges, int doubles, int triples)
    {
        var result = SmilesReader.Read(smiles);
        Assert.True(result.Succeeded, string.Join("; ", result.Problems));
        var m = result.Value!;
        Assert.Equal(hydrogens, m.Atoms.Select(a => a.HydrogenCount));
        Assert.Equal(charges, m.Atoms.Select(a => a.Charge));
        Assert.Equal(doubles, m.Bonds.Count(b => b.Order == 2));
        Assert.Equal(triples, m.Bonds.Count(b => b.Order == 3));
    }

    [Fact]
    public void Read_BracketAtom_KeepsIsotopeClassAndChirality()
    {
        var m = SmilesReader.Read("[13CH3:7][C@@H](F)Cl").Value!;
        Assert.Equal(13, m.Atoms[0].Isotope);
        Assert.Equal(7, m.Atoms[0].AtomClass);
        var t = Assert.Single(m.TetrahedralStereo);
        Assert.Equal([0, -1, 2, 3], t.Neighbours.ToArray());
        Assert.Equal(Model.TetrahedralWinding.Clockwise, t.Winding);
    }

    [Theory]
    [InlineData("[H][C@@](F)(Cl)Br", "[C@@H](F)(Cl)Br")] // OpenSMILES: an explicit [H] neighbour counts in written order
    [InlineData("F[C@@]([H])(Cl)Br", "F[C@@H](Cl)Br")]
    [InlineData("[H]/C(F)=C/F", "C(/F)=C/F")] // H below, far F above, so the two F are cis; the folded H reference moves to F
    public void Read_ExplicitHydrogenNeighbour_KeepsConfiguration(string withH, string withoutH)
    {
        var a = SmilesReader.Read(withH).Value!;
        var b = SmilesReader.Read(withoutH).Value!;
        Assert.Null(TestSupport.GraphAssert.Difference(b, a, TestSupport.GraphAssert.Identity(a.AtomCount)));
    }

    [Theory]
    [InlineData("F/C=C/F", Model.DoubleBondConfiguration.Trans)]
    [InlineData("F/C=C\\F", Model.DoubleBondConfiguration.Cis)]
    [InlineData("F\\C=C/F", Model.DoubleBondConfiguration.Cis)]
    [InlineData("C(\\F)=C/F", Model.DoubleBondConfiguration.Trans)]
    public void Read_DirectionalBonds_GiveOpenSmilesConfiguration(string smiles, Model.DoubleBondConfiguration expected)
    {
        // Source: OpenSMILES specification §3.7 (F/C=C/F trans, F/C=C\F cis; C(\F)=C/F is the same trans isomer as F/C=C/F).
        var d = Assert.Single(SmilesReader.Read(smiles).Value!.DoubleBondStereo);
        Assert.Equal(expected, d.Configuration);
    }
}
