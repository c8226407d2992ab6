using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Tests.Solvents;

public sealed class SolventTablesTests
{
    // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1 (residual 1H and H2O).
    // Source: Fulmer et al., Organometallics 2010, 29, 2176, Table 1 for CD2Cl2 water, THF-d8 and toluene-d8.
    [Theory]
    [InlineData("CDCl3", 7.26, 1.56)]
    [InlineData("DMSO-d6", 2.50, 3.33)]
    [InlineData("CD3OD", 3.31, 4.87)]
    [InlineData("acetone-d6", 2.05, 2.84)]
    [InlineData("C6D6", 7.16, 0.40)]
    [InlineData("CD3CN", 1.94, 2.13)]
    [InlineData("CD2Cl2", 5.32, 1.52)]
    [InlineData("THF-d8", 1.72, 2.46)]
    [InlineData("toluene-d8", 2.08, 0.43)]
    public void For_Solvent_GivesPublishedResidualAndWater(string solvent, double residual, double water)
    {
        var lines = ResidualSolventTable.For(solvent, Nucleus.H1).ToList();
        Assert.Contains(lines, l => l.Kind == SolventLineKind.Residual && l.ShiftPpm == residual);
        Assert.Equal(water, Assert.Single(lines, l => l.Kind == SolventLineKind.Water).ShiftPpm);
    }

    // Source: Fulmer 2010 Table 2 (via a transcription): 77.16, 39.52, 49.00, 128.06, 53.84.
    [Theory]
    [InlineData("CDCl3", 77.16, "t")]
    [InlineData("DMSO-d6", 39.52, "sept")]
    [InlineData("CD3OD", 49.00, "sept")]
    [InlineData("C6D6", 128.06, "t")]
    [InlineData("CD2Cl2", 53.84, "quint")]
    public void For_SolventCarbon_GivesPublishedLine(string solvent, double shift, string multiplicity)
    {
        var line = Assert.Single(ResidualSolventTable.For(solvent, Nucleus.C13));
        Assert.Equal((shift, multiplicity), (line.ShiftPpm, line.Multiplicity));
    }

    // Source: RDKit 2022+ (Debian python3-rdkit, /usr/bin/python3): sum of GetTotalNumHs over atoms of the SMILES.
    [Theory]
    [InlineData("acetic acid", 4)]
    [InlineData("acetone", 6)]
    [InlineData("acetonitrile", 3)]
    [InlineData("benzene", 6)]
    [InlineData("tert-butyl methyl ether", 12)]
    [InlineData("chloroform", 1)]
    [InlineData("dichloromethane", 2)]
    [InlineData("diethyl ether", 10)]
    [InlineData("DMF", 7)]
    [InlineData("DMSO", 6)]
    [InlineData("1,4-dioxane", 8)]
    [InlineData("ethanol", 6)]
    [InlineData("ethyl acetate", 8)]
    [InlineData("n-hexane", 14)]
    [InlineData("methanol", 4)]
    [InlineData("n-pentane", 12)]
    [InlineData("2-propanol", 8)]
    [InlineData("pyridine", 5)]
    [InlineData("tetrahydrofuran", 8)]
    [InlineData("toluene", 8)]
    [InlineData("triethylamine", 15)]
    public void ImpurityGroups_ProtonCounts_AddUpToTheStructure(string name, int hydrogens)
    {
        var impurity = ImpurityTable.Find(name)!;
        Assert.NotNull(impurity.Smiles);
        Assert.Equal(hydrogens, impurity.Groups.Sum(g => g.ProtonCount ?? 0));
    }

    // Source: Gottlieb 1997 Table 1 (ethyl acetate CDCl3 column; DMSO-d6 column via Fulmer's transcription).
    [Fact]
    public void ImpurityTable_EthylAcetate_HasPublishedShiftsWithSources()
    {
        var groups = ImpurityTable.Find("ethyl acetate")!.Groups;
        var ch2 = Assert.Single(groups, g => g.Label == "OCH2");
        Assert.Equal(("q", (int?)7), (ch2.Multiplicity, ch2.JHz));
        var cdcl3 = Assert.Single(ch2.Shifts, s => s.Solvent == "CDCl3" && s.Nucleus == Nucleus.H1);
        Assert.Equal((4.12, Provenance.Published), (cdcl3.Ppm, cdcl3.Source.Provenance));
        Assert.Equal(59.74, Assert.Single(ch2.Shifts, s => s.Solvent == "DMSO-d6" && s.Nucleus == Nucleus.C13).Ppm);
    }

    [Fact]
    public void ImpurityTable_MemoryValues_AreMarked()
    {
        // Reference notes §2: Gottlieb 13C values for tert-butyl methyl ether and DMSO are from memory.
        var dmso = ImpurityTable.Find("DMSO")!.Groups.Single().Shifts.Where(s => s.Nucleus == Nucleus.C13);
        Assert.All(dmso, s => Assert.Equal(Provenance.FromMemory, s.Source.Provenance));
    }

    [Fact]
    public void ImpurityTable_EveryShift_NamesASource()
    {
        var shifts = ImpurityTable.All.SelectMany(i => i.Groups).SelectMany(g => g.Shifts).ToList();
        Assert.True(shifts.Count > 100);
        Assert.All(shifts, s => Assert.Contains(s.Source.Source, new[] { SolventSources.Gottlieb1997, SolventSources.Fulmer2010 }));
    }
}
