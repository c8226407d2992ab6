using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Engine.Telemetry;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Telemetry;

/// <summary>
/// The engine's counters, histograms and activities, observed through the System.Diagnostics listeners an
/// OpenTelemetry SDK uses, agree with the report of a real entry checked with the real rule plugins.
/// </summary>
[Collection(TelemetryCollection.Name)]
public sealed class EngineTelemetryTests
{
    private static readonly string[] Plugins =
    [
        "ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Rules.SolventResidual", "ConsistencyHost.Rules.SignalCount",
        "ConsistencyHost.Rules.IntegralRatio", "ConsistencyHost.Rules.CouplingPartners", "ConsistencyHost.Rules.MassFormula",
        "ConsistencyHost.Fixtures.ThrowingRule",
    ];

    // Ethyl 4-aminobenzoate (C9H11NO2) as the README's example entry, with three faults an ELN sees: the
    // residual CHCl3 line at 7.26 reported as a compound signal (Source: Gottlieb, Kotlyar, Nudelman, J. Org.
    // Chem. 1997, 62, 7512, Table 1: CHCl3 in CDCl3 7.26), a 13C list without solvent, and an [M+H]+ whose
    // "calculated" value belongs to no formula here (the structure's is 166.0863: NIST masses, electron removed).
    private static readonly EntrySubmission FaultyEntry = new()
    {
        EntryId = "AIS-LQ-T900",
        Structure = new StructureSource(StructureFormat.Smiles, "CCOC(=O)c1ccc(N)cc1"),
        ReportedText =
        [
            "1H NMR (400 MHz, CDCl3) δ 7.86 (d, J = 8.7 Hz, 2H), 7.26 (s, 1H), 6.64 (d, J = 8.7 Hz, 2H), 4.31 (q, J = 7.1 Hz, 2H), 4.05 (br s, 2H), 1.36 (t, J = 7.1 Hz, 3H).",
            "13C NMR (101 MHz) δ 166.8, 150.8, 131.6, 120.1, 113.8, 60.3, 14.4.",
            "HRMS (ESI) m/z: [M+H]+ calcd for C9H12NO2 166.0950; found 166.0951.",
        ],
    };

    [Fact]
    public void Check_RealEntryWithRealPlugins_CountersEqualTheReport()
    {
        using var folder = PluginFolder.With(Plugins);
        var engine = new CheckEngine(new EngineOptions { PluginsPath = folder.Path });
        using var recorder = new TelemetryRecorder();

        var report = engine.Check(FaultyEntry);

        // The entry must exercise what is counted: findings of more than one severity and a failed run.
        Assert.True(report.Findings.Select(f => f.Finding.Severity).Distinct().Count() >= 2, "expected findings of two severities");
        Assert.Contains(report.RuleRuns, r => r.Status == RuleRunStatus.Failed);
        var checks = Assert.Single(recorder.Of(TelemetryNames.Checks));
        Assert.Equal(("default", 1.0), (checks.Tags[TelemetryNames.ProfileTag], checks.Value));
        Assert.Equal(
            Tally(report.RuleRuns.Select(r => (r.RuleId, TelemetryValues.Status(r.Status)))),
            Tally(recorder.Of(TelemetryNames.RuleRuns), TelemetryNames.StatusTag));
        Assert.Equal(
            Tally(report.Findings.Select(f => (f.RuleId, TelemetryValues.Severity(f.Finding.Severity)))),
            Tally(recorder.Of(TelemetryNames.Findings), TelemetryNames.SeverityTag));
    }

    [Fact]
    public void Check_RealEntry_DurationsRecordedInMillisecondsPerRuleThatRan()
    {
        using var folder = PluginFolder.With(Plugins);
        var engine = new CheckEngine(new EngineOptions { PluginsPath = folder.Path });
        using var recorder = new TelemetryRecorder();

        var report = engine.Check(FaultyEntry);

        var ruleDurations = recorder.Of(TelemetryNames.RuleDuration);
        Assert.Equal(report.RuleRuns.Select(r => r.RuleId).Order(StringComparer.Ordinal), ruleDurations.Select(m => m.Tags[TelemetryNames.RuleTag]).Order(StringComparer.Ordinal));
        Assert.All(ruleDurations, m => Assert.Equal("ms", m.Unit));
        // Each rule's recorded time is the report's elapsed time for it, in milliseconds.
        Assert.All(report.RuleRuns, run => Assert.Equal(run.Elapsed.TotalMilliseconds, ruleDurations.Single(m => m.Tags[TelemetryNames.RuleTag] == run.RuleId).Value, 6));
        var check = Assert.Single(recorder.Of(TelemetryNames.CheckDuration));
        Assert.True(check.Value >= report.RuleRuns.Max(r => r.Elapsed.TotalMilliseconds), "the check includes its slowest rule");
    }

    [Fact]
    public void Check_RealEntry_OneActivityWithTheEntryIdAndOneChildPerRule()
    {
        using var folder = PluginFolder.With(Plugins);
        var engine = new CheckEngine(new EngineOptions { PluginsPath = folder.Path });
        using var recorder = new TelemetryRecorder();

        var report = engine.Check(FaultyEntry);

        var check = Assert.Single(recorder.Activities, a => a.OperationName == TelemetryNames.CheckActivity);
        Assert.Equal("AIS-LQ-T900", check.GetTagItem(TelemetryNames.EntryIdTag));
        Assert.Equal(report.Findings.Count, check.GetTagItem(TelemetryNames.FindingCountTag));
        var children = recorder.Activities.Where(a => a.ParentSpanId == check.SpanId).ToList();
        Assert.All(children, child => Assert.Equal((TelemetryNames.RuleActivity, check.TraceId), (child.OperationName, child.TraceId)));
        Assert.Equal(
            report.RuleRuns.Select(r => $"{r.RuleId}:{TelemetryValues.Status(r.Status)}").Order(StringComparer.Ordinal),
            children.Select(c => $"{c.GetTagItem(TelemetryNames.RuleTag)}:{c.GetTagItem(TelemetryNames.StatusTag)}").Order(StringComparer.Ordinal));
        Assert.Equal(System.Diagnostics.ActivityStatusCode.Error, children.Single(c => (string?)c.GetTagItem(TelemetryNames.RuleTag) == "fixture-throws").Status);
    }

    [Fact]
    public void StartCheck_NobodyListening_CreatesNoActivity()
    {
        Assert.Null(EngineTelemetry.StartCheck("AIS-LQ-T901"));
    }

    private static Dictionary<string, int> Tally(IEnumerable<(string Rule, string Value)> pairs) =>
        pairs.GroupBy(p => $"{p.Rule}|{p.Value}").ToDictionary(g => g.Key, g => g.Count());

    private static Dictionary<string, int> Tally(IEnumerable<TelemetryRecorder.Measurement> measurements, string tag) =>
        measurements.GroupBy(m => $"{m.Tags[TelemetryNames.RuleTag]}|{m.Tags[tag]}").ToDictionary(g => g.Key, g => (int)g.Sum(m => m.Value));
}
