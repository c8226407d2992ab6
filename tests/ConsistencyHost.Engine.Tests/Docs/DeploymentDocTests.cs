using System.Reflection;
using System.Text.RegularExpressions;
using ConsistencyHost.Engine.Telemetry;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Docs;

/// <summary>docs/deployment.md's instrument and activity tables name exactly what the code records.</summary>
public sealed partial class DeploymentDocTests
{
    [GeneratedRegex(@"^\| `(?<name>consistencyhost\.[a-z_.]+)` \| (?<kind>[a-z]+) \| `(?<unit>[^`]+)` \| (?<tags>[^|]+) \|", RegexOptions.Multiline)]
    private static partial Regex InstrumentRow();

    [GeneratedRegex(@"^\| `(?<name>consistencyhost\.[a-z_.]+)` \(", RegexOptions.Multiline)]
    private static partial Regex ActivityRow();

    private static string Guide => File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "deployment.md")).Replace("\r\n", "\n");

    [Fact]
    public void InstrumentTable_NamesEveryInstrumentConstantAndNoOther()
    {
        var documented = InstrumentRow().Matches(Guide).Select(m => m.Groups["name"].Value).Order(StringComparer.Ordinal);
        string[] instruments = [TelemetryNames.Checks, TelemetryNames.RuleRuns, TelemetryNames.Findings, TelemetryNames.RuleDuration, TelemetryNames.CheckDuration, TelemetryNames.WorkerRestarts];

        Assert.Equal(instruments.Order(StringComparer.Ordinal), documented);
        // Every dotted "consistencyhost.*" constant (the span tags, spelled with underscores, aside) is an instrument or an activity.
        var allNames = typeof(TelemetryNames).GetFields(BindingFlags.Public | BindingFlags.Static)
            .Select(f => (string)f.GetRawConstantValue()!).Where(v => v.StartsWith("consistencyhost.", StringComparison.Ordinal) && !v.Contains('_', StringComparison.Ordinal));
        Assert.Equal(allNames.Order(StringComparer.Ordinal), instruments.Concat([TelemetryNames.CheckActivity, TelemetryNames.RuleActivity]).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void InstrumentTable_DurationsInMillisecondsAndTagsAsRecorded()
    {
        var rows = InstrumentRow().Matches(Guide).ToDictionary(m => m.Groups["name"].Value);

        Assert.Equal(("histogram", "ms"), (rows[TelemetryNames.RuleDuration].Groups["kind"].Value, rows[TelemetryNames.RuleDuration].Groups["unit"].Value));
        Assert.Equal(("histogram", "ms"), (rows[TelemetryNames.CheckDuration].Groups["kind"].Value, rows[TelemetryNames.CheckDuration].Groups["unit"].Value));
        Assert.Equal($"`{TelemetryNames.RuleTag}`, `{TelemetryNames.StatusTag}`", rows[TelemetryNames.RuleRuns].Groups["tags"].Value.Trim());
        Assert.Equal($"`{TelemetryNames.RuleTag}`, `{TelemetryNames.SeverityTag}`", rows[TelemetryNames.Findings].Groups["tags"].Value.Trim());
        Assert.Equal($"`{TelemetryNames.PluginTag}`", rows[TelemetryNames.WorkerRestarts].Groups["tags"].Value.Trim());
        Assert.Equal($"`{TelemetryNames.ProfileTag}`", rows[TelemetryNames.Checks].Groups["tags"].Value.Trim());
    }

    [Fact]
    public void ActivityTable_NamesTheCheckAndRuleActivities()
    {
        Assert.Equal(
            [TelemetryNames.CheckActivity, TelemetryNames.RuleActivity],
            ActivityRow().Matches(Guide).Select(m => m.Groups["name"].Value));
        Assert.Contains($"`{TelemetryNames.EntryIdTag}`", Guide, StringComparison.Ordinal);
        Assert.Contains($"`{TelemetryNames.RequestIdTag}`", Guide, StringComparison.Ordinal);
    }
}
