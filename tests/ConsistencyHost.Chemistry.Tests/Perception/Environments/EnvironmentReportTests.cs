using ConsistencyHost.Chemistry.Perception.Environments;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Environments;

public sealed class EnvironmentReportTests
{
    [Fact]
    public void Describe_2Butanol_ListsClassesAndRange()
    {
        // 2-butanol: C3-H2 diastereotopic next to the C2 stereocentre (nmr-methods.md §2.2); OH exchangeable.
        var r = EnvironmentReport.Describe(SmilesReader.Read("CC(O)CC").Value!);
        Assert.Equal("C4H10O", r.Formula);
        Assert.Equal(74.073165, r.MonoisotopicMass, 6); // 4 × 12 + 10 × 1.00782503223 + 15.99491461957 (NIST)
        Assert.Equal(74.123, r.AverageMass, 3); // 4 × 12.011 + 10 × 1.008 + 15.999 (CIAAW conventional)
        Assert.Equal([[0], [1], [2], [3], [4]], r.HeavyAtomClasses.Select(c => c.ToArray()));
        Assert.Equal([[0], [1], [3], [4]], r.CarbonClasses13C.Select(c => c.ToArray()));
        Assert.Equal([[0, 0, 0], [1], [2], [3], [3], [4, 4, 4]], r.HydrogenClasses.Select(c => c.ToArray()));
        Assert.Equal((4, 6), (r.Expected1H.Min, r.Expected1H.Max));
        Assert.Equal(2, r.Expected1H.Reasons.Count);
        Assert.Equal((4, 4), (r.Expected13C.Min, r.Expected13C.Max));
    }

    [Fact]
    public void Describe_PentanediolWithoutConfiguration_GivesMesoDlRange()
    {
        // nmr-methods.md §2.4: C3-H2 of 2,4-pentanediol gives 1 (dl) or 2 (meso) signals, so 4 to 5 H classes.
        var r = EnvironmentReport.Describe(SmilesReader.Read("CC(O)CC(O)C").Value!);
        Assert.Equal(5, r.Expected1H.Max);
        Assert.Equal(3, r.Expected1H.Min); // minus the OH class and the possibly coinciding meso CH2 pair
        Assert.Contains(r.Expected1H.Reasons, s => s.Contains("relative configuration", StringComparison.Ordinal));
        Assert.Equal([[0, 6], [1, 4], [3]], r.CarbonClasses13C.Select(c => c.ToArray()));
    }

    [Fact]
    public void Describe_InositolWithoutConfiguration_SpansScylloToMyo()
    {
        // Common practice (from memory of the 13C spectra): scyllo-inositol shows one 13C line, myo-inositol four
        // (C2, C5, C1/C3, C4/C6); as 1H classes myo has 4 CH + 4 OH, scyllo 1 CH + 1 OH.
        var r = EnvironmentReport.Describe(SmilesReader.Read("OC1C(O)C(O)C(O)C(O)C1O").Value!);
        Assert.Equal((1, 4), (r.Expected13C.Min, r.Expected13C.Max));
        Assert.Equal((1, 8), (r.Expected1H.Min, r.Expected1H.Max));
    }

    [Fact]
    public void Describe_MolfileAndSmiles_GiveTheSameReport()
    {
        // Same compound (L-alanine) from two readers; the molfile is RDKit's MolToMolBlock of N[C@@H](C)C(=O)O.
        var molfile = ConsistencyHost.Chemistry.Tests.Molfile.MolfileReaderStereoTests.Alanine;
        var a = EnvironmentReport.Describe(ConsistencyHost.Chemistry.Molfile.MolfileReader.Read(molfile).Value!);
        var b = EnvironmentReport.Describe(SmilesReader.Read("N[C@@H](C)C(=O)O").Value!);
        Assert.Equal(System.Text.Json.JsonSerializer.Serialize(b), System.Text.Json.JsonSerializer.Serialize(a));
    }
}
