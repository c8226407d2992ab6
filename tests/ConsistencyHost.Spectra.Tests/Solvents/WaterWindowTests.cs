using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Tests.Solvents;

/// <summary>
/// The water window of each solvent is anchored on the published water (HOD) row and reaches only as far as its
/// stated tolerance: upfield 0.10 ppm (0.05 in D2O), downfield per solvent (docs/rules/solvent-residual.md).
/// </summary>
public sealed class WaterWindowTests
{
    private static readonly ResidualMatcher Matcher = new();

    // table, solvent, published water/HOD shift, upfield and downfield tolerance (WaterWindowTable, with its reasons).
    public static TheoryData<string, string, double, double, double> PublishedRows => new()
    {
        { "Gottlieb 1997 Table 1", "CDCl3", 1.56, 0.10, 0.50 },
        { "Gottlieb 1997 Table 1", "DMSO-d6", 3.33, 0.10, 0.15 },
        { "Gottlieb 1997 Table 1", "CD3OD", 4.87, 0.10, 0.10 },
        { "Gottlieb 1997 Table 1", "D2O", 4.79, 0.05, 0.05 },
        { "Gottlieb 1997 Table 1", "acetone-d6", 2.84, 0.10, 0.30 },
        { "Gottlieb 1997 Table 1", "C6D6", 0.40, 0.10, 0.50 },
        { "Gottlieb 1997 Table 1", "CD3CN", 2.13, 0.10, 0.30 },
        { "Fulmer 2010 Table 1", "CD2Cl2", 1.52, 0.10, 0.30 },
        { "Fulmer 2010 Table 1", "THF-d8", 2.46, 0.10, 0.30 },
        { "Fulmer 2010 Table 1", "toluene-d8", 0.43, 0.10, 0.50 },
    };

    [Theory]
    [MemberData(nameof(PublishedRows))]
    public void Match_WaterWindow_SpansThePublishedRowLessUpfieldPlusDownfieldTolerance(string table, string solvent, double published, double below, double above)
    {
        Assert.Equal(published, WaterLine(solvent, published)!.ReferencePpm);
        Assert.NotNull(WaterLine(solvent, published - below));
        Assert.NotNull(WaterLine(solvent, published + above));
        Assert.True(WaterLine(solvent, published - below - 0.02) is null, $"{table}: {solvent} water window reaches below {published} - {below}");
        Assert.True(WaterLine(solvent, published + above + 0.02) is null, $"{table}: {solvent} water window reaches above {published} + {above}");
    }

    // Gottlieb 1997 Table 1 footnotes (reference notes §1.2, from memory there): HDO at 3.30 in DMSO-d6 and 2.81 in
    // acetone-d6, 0.03 ppm upfield of H2O; the upfield tolerance must keep them.
    [Theory]
    [InlineData("DMSO-d6", 3.30)]
    [InlineData("acetone-d6", 2.81)]
    public void Match_HdoFootnoteShift_IsStillWater(string solvent, double hdo) => Assert.NotNull(WaterLine(solvent, hdo));

    // Gottlieb 1997 Table 1: water 1.56 in CDCl3, and hydrogen-bond acceptors only move it downfield. A one-proton
    // singlet at 1.30 (a tertiary alcohol's O–H, common practice) was inside the former ±0.5 window; it is not water.
    [Fact]
    public void Match_SingletWellUpfieldOfWaterInCdcl3_IsNotAWaterCandidate() => Assert.Null(WaterLine("CDCl3", 1.30));

    // Every solvent with a water (or HOD) row has its own window, and its reason names the published table and marks
    // each tolerance that is not printed there.
    [Fact]
    public void WaterWindowTable_CoversEverySolventWithAWaterRow_WithASourcedReason()
    {
        var solvents = ResidualSolventTable.Lines
            .Where(l => l.Nucleus == Nucleus.H1 && (l.Kind == SolventLineKind.Water || l.Solvent == "D2O"))
            .Select(l => l.Solvent).Distinct().ToList();
        Assert.Equal(10, solvents.Count);
        foreach (var solvent in solvents)
        {
            Assert.True(WaterWindowTable.All.TryGetValue(solvent, out var window), solvent + " has no water window");
            Assert.Matches("Gottlieb 1997|Fulmer 2010", window.Reason);
            Assert.Matches("common practice|from memory", window.Reason);
        }
    }

    [Fact]
    public void Match_NarrowerWaterWindowOption_IsHonoured()
    {
        var narrow = new ResidualMatcher(ResidualMatchOptions.Default with
        {
            WaterWindows = new Dictionary<string, ShiftWindow> { ["CDCl3"] = new(0.02, 0.02, "test: a dry, acceptor-free sample") },
        });
        Assert.DoesNotContain(narrow.Match(Nucleus.H1, "CDCl3", [new Signal { ShiftPpm = 1.70 }]).Matches, m => m.Kind == ResidualMatchKind.Water);
        Assert.Contains(Matcher.Match(Nucleus.H1, "CDCl3", [new Signal { ShiftPpm = 1.70 }]).Matches, m => m.Kind == ResidualMatchKind.Water);
    }

    // In D2O the HOD line is the solvent's own residual line; elsewhere the water row.
    private static ResidualMatch? WaterLine(string solvent, double ppm) =>
        Matcher.Match(Nucleus.H1, solvent, [new Signal { ShiftPpm = ppm, Multiplicity = "s" }]).Matches
            .FirstOrDefault(m => m.Kind == ResidualMatchKind.Water || (solvent == "D2O" && m.Kind == ResidualMatchKind.ResidualSolvent));
}
