using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Engine.Running;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Tests.Running;

/// <summary>
/// Issue 14, item 4: a rule that floods its report (two findings with 10 MB messages, as tried against the host)
/// is cut to the limits, fails with the reason, and cannot push the other rules' findings out of the reply.
/// </summary>
public sealed class ReportLimitsTests
{
    private static readonly ReportLimits Limits = ReportLimits.Default;

    [Fact]
    public void Apply_TwoTenMegabyteMessages_CutsThemFailsTheRunAndSaysSo()
    {
        var huge = new string('x', 10 * 1000 * 1000);
        var findings = new[] { Reported("flood", huge), Reported("flood", huge) };

        var (record, kept, cut) = Limits.Apply(Ok("flood", 2), findings, ruleCount: 2);

        Assert.NotNull(cut);
        Assert.Equal(RuleRunStatus.Failed, record.Status);
        Assert.Contains("MaxMessageChars", record.Message, StringComparison.Ordinal);
        Assert.Equal(3, kept.Count);
        Assert.All(kept.Take(2), f => Assert.True(f.Finding.Message.Length < Limits.MaxMessageChars + 100));
        Assert.Equal(ReportLimits.CutCode, kept[^1].Finding.Code);
        // The whole rule stays within its share of the reply budget.
        Assert.True(kept.Sum(f => System.Text.Encoding.UTF8.GetByteCount(f.Finding.Message)) < Limits.MaxReplyBytes / 2);
    }

    [Fact]
    public void Apply_MoreFindingsThanAllowed_KeepsTheLimitPlusOneNotice()
    {
        var findings = Enumerable.Range(0, Limits.MaxFindingsPerRule + 50).Select(i => Reported("many", $"finding {i}")).ToList();

        var (record, kept, _) = Limits.Apply(Ok("many", findings.Count), findings, ruleCount: 1);

        Assert.Equal(RuleRunStatus.Failed, record.Status);
        Assert.Contains("MaxFindingsPerRule", record.Message, StringComparison.Ordinal);
        Assert.Equal(Limits.MaxFindingsPerRule + 1, kept.Count);
        Assert.Equal(kept.Count, record.FindingCount);
    }

    [Fact]
    public void Apply_OverItsShareOfTheReply_StopsAtTheShareSoOtherRulesKeepTheirs()
    {
        var small = Limits with { MaxReplyBytes = 40_000 };
        // 100 findings of 1,000 characters each: within the per-finding and count limits, over a 10 kB share.
        var findings = Enumerable.Range(0, 100).Select(_ => Reported("wide", new string('y', 1000))).ToList();

        var (record, kept, _) = small.Apply(Ok("wide", findings.Count), findings, ruleCount: 4);

        Assert.Equal(RuleRunStatus.Failed, record.Status);
        Assert.Contains("MaxReplyBytes", record.Message, StringComparison.Ordinal);
        Assert.True(kept.Take(kept.Count - 1).Sum(f => f.Finding.Message.Length) <= 40_000 / 4);
    }

    [Fact]
    public void Apply_WithinEveryLimit_ReturnsTheSameFindingsUntouched()
    {
        var findings = new[] { Reported("solvent", "solvent not stated") };

        var (record, kept, cut) = Limits.Apply(Ok("solvent", 1), findings, ruleCount: 6);

        Assert.Null(cut);
        Assert.Equal(RuleRunStatus.Ok, record.Status);
        Assert.Same(findings, kept);
    }

    private static RuleRunRecord Ok(string rule, int count) => new(rule, "1.0.0", RuleRunStatus.Ok, TimeSpan.Zero, "", count);

    private static ReportedFinding Reported(string rule, string message) => new(rule, "1.0.0", new Finding("code", Severity.Warning, message));
}
