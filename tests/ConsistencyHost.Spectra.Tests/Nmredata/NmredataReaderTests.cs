using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Nmredata;

namespace ConsistencyHost.Spectra.Tests.Nmredata;

public sealed class NmredataReaderTests
{
    [Fact]
    public void Read_Version11Record_GivesHeaderTags()
    {
        var result = NmredataReader.Read(NmredataFixtures.Version11Record);
        Assert.True(result.Succeeded, string.Join("; ", result.Problems.Select(p => p.Message)));
        Assert.Empty(result.Problems);
        var record = Assert.Single(result.Records);
        Assert.Equal(("1.1", "C8H7FO", "CC(=O)c1ccc(F)cc1", "CDCl3", (double?)298.0),
            (record.Version, record.Formula, record.Smiles, record.Solvent, record.TemperatureK));
        Assert.EndsWith("M  END", record.MolfileText);
        Assert.StartsWith("4'-fluoroacetophenone", record.MolfileText);
    }

    [Fact]
    public void Read_Version11Record_GivesAssignmentsWithImplicitHydrogens()
    {
        var record = NmredataReader.Read(NmredataFixtures.Version11Record).Records.Single();
        Assert.Equal(10, record.Assignments.Count);
        Assert.Equal([new NmredataAtom(1, true)], record.Assignment("HMe")!.Atoms);
        Assert.Equal([new NmredataAtom(5, false), new NmredataAtom(10, false)], record.Assignment("C2")!.Atoms);
        Assert.Equal(7.13, record.Assignment("H3,H5")!.ShiftPpm);
        Assert.Equal(-105.4, record.Assignment("F")!.ShiftPpm);
    }

    [Fact]
    public void Read_Version11Record_GivesCompiledCouplings()
    {
        var record = NmredataReader.Read(NmredataFixtures.Version11Record).Records.Single();
        Assert.Equal(
            [("H2", "H3,H5", 8.80, (int?)3), ("H3,H5", "F", 8.60, 3), ("H2", "F", 5.40, 4), ("C4", "F", 254.60, 1)],
            record.Couplings.Select(j => (j.Label1, j.Label2, j.Hz, j.BondCount)));
    }

    [Fact]
    public void Read_Version11Record_GivesOneDimensionalSpectra()
    {
        var record = NmredataReader.Read(NmredataFixtures.Version11Record).Records.Single();
        Assert.Equal(["NMREDATA_1D_1H", "NMREDATA_1D_13C", "NMREDATA_1D_19F"], record.SpectrumTags);
        var (proton, carbon, fluorine) = (record.Spectra[0], record.Spectra[1], record.Spectra[2]);
        Assert.Equal((Nucleus.H1, (double?)400.13, "CDCl3"), (proton.Nucleus, proton.FrequencyMHz, proton.Solvent));
        var h2 = proton.Signals[0];
        Assert.Equal((7.98, "dd", (double?)2, (double?)2.01), (h2.ShiftPpm!.Value, h2.Multiplicity, h2.ProtonCount, h2.Integral));
        Assert.Equal([(8.80, "H3,H5"), (5.40, "F")], h2.Couplings.Select(j => (j.Hz, j.PartnerLabel!)));
        Assert.Equal(["H3,H5"], proton.Signals[1].Assignments);
        Assert.Equal(0.9, proton.Signals[2].LineWidthHz);
        Assert.Equal("1H", carbon.Decoupled);
        Assert.Equal([0, 0, 0, 1, 1, 3], carbon.Signals.Select(s => s.AttachedHydrogenCount!.Value));
        Assert.Equal(254.60, carbon.Signals[1].Couplings.Single().Hz);
        Assert.Equal((Nucleus.F19, -105.4, 1), (fluorine.Nucleus, fluorine.Signals.Single().ShiftPpm!.Value, fluorine.Signals.Single().NucleusCount!.Value));
    }

    [Fact]
    public void Read_TwoRecordsOfVersions11And10_ReadsBoth()
    {
        var result = NmredataReader.Read(NmredataFixtures.TwoRecords);
        Assert.True(result.Succeeded, string.Join("; ", result.Problems.Select(p => p.Message)));
        Assert.Equal(2, result.Records.Count);
        var old = result.Records[1];
        Assert.Equal(("1.0", "CDCl3", (double?)298.15), (old.Version, old.Solvent, old.TemperatureK));
        var range = old.Spectra.Single().Signals[0];
        Assert.Equal(((double?)7.96, (double?)8.0), (range.RangeLowPpm, range.RangeHighPpm));
        Assert.Equal(500.13, old.Spectra.Single().FrequencyMHz);
    }

    [Fact]
    public void Read_TagLines_AreKeptWithoutComments()
    {
        var record = NmredataReader.Read(NmredataFixtures.Version11Record).Records.Single();
        Assert.Equal("Me, 26.5000, 1", record.Tags["NMREDATA_ASSIGNMENT"][0]);
        Assert.Equal(["0"], record.Tags["NMREDATA_LEVEL"]);
    }
}
