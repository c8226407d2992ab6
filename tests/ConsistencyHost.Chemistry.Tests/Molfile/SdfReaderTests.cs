using ConsistencyHost.Chemistry.Molfile;

namespace ConsistencyHost.Chemistry.Tests.Molfile;

public sealed class SdfReaderTests
{
    // Two records in CTfile SDfile layout: a chloroform molfile with two data items, then a broken record.
    private const string Sdf = """
        chloroform
          hand

          4  3  0  0  0  0  0  0  0  0999 V2000
            0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            1.5000    0.0000    0.0000 Cl  0  0  0  0  0  0  0  0  0  0  0  0
           -0.7500    1.2990    0.0000 Cl  0  0  0  0  0  0  0  0  0  0  0  0
           -0.7500   -1.2990    0.0000 Cl  0  0  0  0  0  0  0  0  0  0  0  0
          1  2  1  0
          1  3  1  0
          1  4  1  0
        M  END
        > <NAME>
        chloroform

        > <NMR>
        7.26 (s, 1H)
        second line

        $$$$
        broken
          hand

        abc
        M  END
        $$$$
        """;

    [Fact]
    public void Read_TwoRecords_StreamsMoleculesDataAndProblems()
    {
        var records = SdfReader.Read(new StringReader(Sdf)).ToList();
        Assert.Equal(2, records.Count);
        Assert.True(records[0].Molecule.Succeeded);
        Assert.Equal(1, records[0].Molecule.Value!.Atoms[0].HydrogenCount);
        Assert.Equal("chloroform", records[0].Data["NAME"]);
        Assert.Equal("7.26 (s, 1H)\nsecond line", records[0].Data["NMR"]);
        Assert.False(records[1].Molecule.Succeeded);
        Assert.Equal(21, records[1].FirstLine);
        Assert.Contains(records[1].Molecule.Problems, p => p.Message == MolfileMessages.BadCountsLine && p.Line == 24);
    }
}
