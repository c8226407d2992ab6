using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Engine.Vetting;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Samples;

/// <summary>The sample lab's rule, loaded by the real engine from disk: once as built, once as source.</summary>
public sealed class SamplePluginTests
{
    private const string Plugin = "Lindqvist.CouplingsListed";

    // Ethyl acetate in CDCl3 with the quartet's J left out: 4.12 (q, 2H), 2.05 (s, 3H), 1.26 (t, J = 7.1 Hz, 3H).
    // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (Table 1) for the shifts and J.
    private static readonly EntrySubmission QuartetWithoutJ = new()
    {
        EntryId = "AIS-LQ-0417",
        Structure = new StructureSource(StructureFormat.Smiles, "CCOC(C)=O"),
        Spectra =
        [
            new SpectrumSubmission
            {
                Nucleus = "1H", Solvent = "CDCl3", FrequencyMHz = 400,
                Signals =
                [
                    new Signal { ShiftPpm = 4.12, Multiplicity = "q", ProtonCount = 2 },
                    new Signal { ShiftPpm = 2.05, Multiplicity = "s", ProtonCount = 3 },
                    new Signal { ShiftPpm = 1.26, Multiplicity = "t", ProtonCount = 3, Couplings = [new Coupling(7.1)] },
                ],
            },
        ],
    };

    [Fact]
    public void Check_CompiledSamplePlugin_ReportsTheQuartetWithoutJ()
    {
        using var folder = PluginFolder.With(Plugin);

        var report = new CheckEngine(new EngineOptions { PluginsPath = folder.Path }).Check(QuartetWithoutJ);

        AssertQuartetReported(report);
    }

    [Fact]
    public void Check_SamplePluginAsSource_IsCompiledVettedAndReportsTheSame()
    {
        using var folder = PluginFolder.With();
        var target = Directory.CreateDirectory(Path.Combine(folder.Path, Plugin)).FullName;
        foreach (var file in SourceFiles.Read(Path.Combine(RepoPaths.Samples, "plugins", Plugin)))
        {
            File.WriteAllText(Path.Combine(target, file.RelativePath), file.Text);
        }

        var engine = new CheckEngine(new EngineOptions { PluginsPath = folder.Path, SourcePluginCachePath = Path.Combine(folder.Path, ".cache") });
        var report = engine.Check(QuartetWithoutJ);

        Assert.Equal(Plugin + " (source)", Assert.Single(engine.Rules).Plugin);
        AssertQuartetReported(report);
    }

    private static void AssertQuartetReported(CheckReport report)
    {
        var run = Assert.Single(report.RuleRuns);
        Assert.Equal(RuleRunStatus.Ok, run.Status);
        var finding = Assert.Single(report.Findings);
        Assert.Equal(("lindqvist-couplings-listed", "couplings-missing"), (finding.RuleId, finding.Finding.Code));
        Assert.Contains("4.12 ppm is reported as q", finding.Finding.Message);
    }
}
