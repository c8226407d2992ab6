using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Rules.Tests;

/// <summary>
/// One engine over every built-in rule plugin, loaded from disk once for the whole test run, and small
/// helpers to check an entry given as SMILES plus reported text.
/// </summary>
internal static class BuiltInRules
{
    private static readonly Lazy<CheckEngine> Shared = new(() => new CheckEngine(new EngineOptions
    {
        PluginsPath = RepoPaths.BuiltInPlugins,
        RuleDeadline = TimeSpan.FromSeconds(30),
    }));

    public static CheckEngine Engine => Shared.Value;

    public static CheckReport Check(string smiles, params string[] reportedText) =>
        Engine.Check(new EntrySubmission
        {
            EntryId = "AIS-LQ-TEST",
            Structure = new StructureSource(StructureFormat.Smiles, smiles),
            ReportedText = reportedText,
        });

    public static IReadOnlyList<string> Codes(this CheckReport report, string ruleId) =>
        [.. report.Findings.Where(f => f.RuleId == ruleId).Select(f => f.Finding.Code)];

    /// <summary>
    /// Every rule ran to completion, or was skipped because the entry lacks the spectra it needs: a failure inside a
    /// rule would otherwise hide as "no finding".
    /// </summary>
    public static CheckReport AllRulesRan(this CheckReport report)
    {
        var broken = report.RuleRuns.Where(r => r.Status is not (RuleRunStatus.Ok or RuleRunStatus.Skipped)).Select(r => $"{r.RuleId}: {r.Status} {r.Message}").ToList();
        Assert.True(broken.Count == 0, string.Join("\n", broken));
        return report;
    }
}
