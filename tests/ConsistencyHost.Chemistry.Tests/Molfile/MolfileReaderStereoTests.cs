using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Molfile;
using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Chemistry.Tests.TestSupport;

namespace ConsistencyHost.Chemistry.Tests.Molfile;

/// <summary>Molfiles written by RDKit (2022.09, Chem.MolToMolBlock / MolToV3KMolBlock after Compute2DCoords) from the
/// SMILES named in each test; the configuration read from wedges and coordinates must equal the SMILES one.</summary>
public sealed class MolfileReaderStereoTests
{
    // Source: RDKit MolToMolBlock of C[C@H](O)CC (hash from C2 to C1).
    private const string Butanol = """

             RDKit          2D

          5  4  0  0  0  0  0  0  0  0999 V2000
           -1.8187   -0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -0.5196    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -0.5196    1.5000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
            0.7794   -0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            2.0785   -0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
          2  1  1  6
          2  3  1  0
          2  4  1  0
          4  5  1  0
        M  END
        """;

    // Source: RDKit MolToMolBlock of N[C@@H](C)C(=O)O.
    internal const string Alanine = """

             RDKit          2D

          6  5  0  0  0  0  0  0  0  0999 V2000
            1.5000   -1.2990    0.0000 N   0  0  0  0  0  0  0  0  0  0  0  0
            0.7500    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            1.5000    1.2990    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -0.7500   -0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -1.5000    1.2990    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
           -1.5000   -1.2990    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
          1  2  1  0
          2  3  1  6
          2  4  1  0
          4  5  2  0
          4  6  1  0
        M  END
        """;

    // Source: RDKit MolToMolBlock of AddHs(C[C@@H](O)CC): the wedge goes to an explicit H that is folded.
    private const string ButanolWithHydrogens = """

             RDKit          2D

         15 14  0  0  0  0  0  0  0  0999 V2000
           -2.0795    0.3804    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -0.5878    0.2225    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -0.7457   -1.2691    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
            0.9039    0.0647    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            2.3955   -0.0932    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -3.5711    0.5383    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
           -1.9216    1.8721    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
           -2.4180   -1.0809    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
           -0.4299    1.7142    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
           -2.0319   -2.0408    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
            1.0617    1.5563    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
            0.7460   -1.4270    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
            3.8872   -0.2511    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
            2.2377   -1.5849    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
            2.5534    1.3985    0.0000 H   0  0  0  0  0  0  0  0  0  0  0  0
          1  2  1  0
          2  3  1  0
          2  4  1  0
          4  5  1  0
          1  6  1  0
          1  7  1  0
          1  8  1  0
          2  9  1  1
          3 10  1  0
          4 11  1  0
          4 12  1  0
          5 13  1  0
          5 14  1  0
          5 15  1  0
        M  END
        """;

    // Source: RDKit MolToMolBlock of C/C=C/C(=O)O.
    private const string CrotonicAcid = """

             RDKit          2D

          6  5  0  0  0  0  0  0  0  0999 V2000
           -2.8748   -0.2197    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -1.4825    0.3386    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -0.3029   -0.5880    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            1.0893   -0.0297    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            1.3020    1.4551    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
            2.2689   -0.9563    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
          1  2  1  0
          2  3  2  0
          3  4  1  0
          4  5  2  0
          4  6  1  0
        M  END
        """;

    // Source: RDKit MolToV3KMolBlock of F/C=C\[C@H](Cl)Br.
    private const string V3000 = """

             RDKit          2D

          0  0  0  0  0  0  0  0  0  0999 V3000
        M  V30 BEGIN CTAB
        M  V30 COUNTS 6 5 0 0 0
        M  V30 BEGIN ATOM
        M  V30 1 F 2.034134 0.651765 0.000000 0
        M  V30 2 C 1.569331 -0.774404 0.000000 0
        M  V30 3 C 0.101830 -1.084956 0.000000 0
        M  V30 4 C -0.900866 0.030660 0.000000 0
        M  V30 5 Cl -2.368367 -0.279893 0.000000 0
        M  V30 6 Br -0.436062 1.456829 0.000000 0
        M  V30 END ATOM
        M  V30 BEGIN BOND
        M  V30 1 1 1 2
        M  V30 2 2 2 3
        M  V30 3 1 3 4
        M  V30 4 1 4 5 CFG=3
        M  V30 5 1 4 6
        M  V30 END BOND
        M  V30 END CTAB
        M  END
        """;

    public static TheoryData<string, string> Chiral => new()
    {
        { Butanol, "C[C@H](O)CC" },
        { Alanine, "N[C@@H](C)C(=O)O" },
        { ButanolWithHydrogens, "C[C@@H](O)CC" },
        { V3000, "F/C=C\\[C@H](Cl)Br" },
    };

    [Theory]
    [MemberData(nameof(Chiral))]
    public void Read_WedgedCentre_GivesTheSmilesConfiguration(string molfile, string smiles)
    {
        var fromMolfile = MolfileReader.Read(molfile);
        var fromSmiles = SmilesReader.Read(smiles).Value!;
        Assert.True(fromMolfile.Succeeded, string.Join("; ", fromMolfile.Problems));
        Assert.Equal(fromSmiles.AtomCount, fromMolfile.Value!.AtomCount);
        StereoAssert.SameTetrahedral(Assert.Single(fromSmiles.TetrahedralStereo), Assert.Single(fromMolfile.Value.TetrahedralStereo));
    }

    [Fact]
    public void Read_ExplicitHydrogens_AreFoldedIntoCounts()
    {
        var m = MolfileReader.Read(ButanolWithHydrogens).Value!;
        Assert.Equal([3, 1, 1, 2, 3], m.Atoms.Select(a => a.HydrogenCount));
    }

    [Theory]
    [InlineData(CrotonicAcid, 1, 0, 3, DoubleBondConfiguration.Trans)]
    [InlineData(V3000, 1, 0, 3, DoubleBondConfiguration.Cis)]
    public void Read_DrawnDoubleBond_GivesCisTransFromCoordinates(string molfile, int bond, int beginRef, int endRef, DoubleBondConfiguration expected)
    {
        var m = MolfileReader.Read(molfile).Value!;
        var d = Assert.Single(m.DoubleBondStereo, x => x.Bond == bond);
        Assert.Equal(expected, StereoAssert.ConfigurationFor(m, d, beginRef, endRef));
    }

    [Fact]
    public void Read_DoubleBondWithOverflowingCoordinates_GivesNoConfigurationInsteadOfThrowing()
    {
        // Found by fuzzing (fuzz/run.sh sdf): finite coordinates near 1E200 overflow the side test to NaN, and
        // Math.Sign(NaN) threw. FC=CF drawn that way has no readable side, so no cis/trans is assigned.
        // Source: CTfile formats (BIOVIA), V2000 atom and bond block layout.
        const string text = """
            FC=CF

            
              4  3  0  0  0  0  0  0  0  0999 V2000
                 1E200     2E200    0.0000 F   0  0  0  0  0  0  0  0  0  0  0  0
                0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                 1E200     1E200    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
                 2E200     1E200    0.0000 F   0  0  0  0  0  0  0  0  0  0  0  0
              1  2  1  0
              2  3  2  0
              3  4  1  0
            M  END
            """;
        var result = MolfileReader.Read(text);
        Assert.True(result.Succeeded, string.Join("; ", result.Problems.Select(p => p.Message)));
        Assert.Equal(4, result.Value!.AtomCount);
        Assert.Empty(result.Value.DoubleBondStereo);
    }
}
