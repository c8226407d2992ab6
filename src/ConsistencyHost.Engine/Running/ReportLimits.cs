using System.Text;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Running;

/// <summary>
/// How much one rule may put into a report. A rule past a limit has its findings cut, gets one finding saying
/// so, and its run is <see cref="RuleRunStatus.Failed"/>; a plugin that keeps doing it is quarantined by its
/// worker executor. The limits keep a whole gRPC reply under the transport's message size, so one rule can never
/// make a reply fail and take the other rules' findings with it.
/// </summary>
public sealed record ReportLimits
{
    /// <summary>The finding code of the one finding that says a rule's output was cut.</summary>
    public const string CutCode = "report-limit-exceeded";

    /// <summary>Findings one rule may report on one entry; the built-in rules report a handful at most.</summary>
    public int MaxFindingsPerRule { get; init; } = 200;

    /// <summary>Characters of one finding's message (and of each evidence value and run message) before it is cut.</summary>
    public int MaxMessageChars { get; init; } = 2000;

    /// <summary>
    /// Bytes of findings a whole report may carry, shared equally among the profile's rules so no rule can
    /// starve another. 3 MiB stays under gRPC's default 4 MiB message size with room for the run records.
    /// </summary>
    public int MaxReplyBytes { get; init; } = 3 * 1024 * 1024;

    /// <summary>The defaults above.</summary>
    public static ReportLimits Default { get; } = new();

    /// <summary>
    /// Applies the limits to one rule's run: returns the record and findings unchanged when they fit, else the
    /// kept findings plus one saying what was cut, and the run as failed with the reason (null when nothing was cut).
    /// </summary>
    public (RuleRunRecord Record, IReadOnlyList<ReportedFinding> Findings, string? Cut) Apply(
        RuleRunRecord record, IReadOnlyList<ReportedFinding> findings, int ruleCount)
    {
        var share = MaxReplyBytes / Math.Max(1, ruleCount);
        if (Fits(findings, share) && record.Message.Length <= MaxMessageChars) return (record, findings, null);
        var kept = new List<ReportedFinding>(Math.Min(findings.Count, MaxFindingsPerRule));
        var (bytes, longMessages, overBudget) = (0L, 0, false);
        foreach (var reported in findings)
        {
            if (kept.Count == MaxFindingsPerRule) break;
            var finding = CutText(reported.Finding, ref longMessages);
            var size = SizeOf(finding);
            if (bytes + size > share)
            {
                overBudget = true;
                break;
            }

            bytes += size;
            kept.Add(reported with { Finding = finding });
        }

        var reasons = new List<string>();
        if (findings.Count > MaxFindingsPerRule) reasons.Add($"reported {findings.Count} findings, more than the {MaxFindingsPerRule} allowed per rule (ReportLimits:MaxFindingsPerRule)");
        if (longMessages > 0) reasons.Add($"{longMessages} message(s) or evidence value(s) longer than {MaxMessageChars} characters were cut (ReportLimits:MaxMessageChars)");
        if (overBudget) reasons.Add($"its findings passed its share of the reply, {share} bytes of {MaxReplyBytes} (ReportLimits:MaxReplyBytes)");
        var runMessage = Cut(record.Message, MaxMessageChars);
        if (reasons.Count == 0) return (runMessage == record.Message ? record : record with { Message = runMessage }, findings, null);

        var reason = $"over the report limits: {string.Join("; ", reasons)}; kept {kept.Count} of {findings.Count} findings";
        kept.Add(new ReportedFinding(record.RuleId, record.RuleVersion, new Finding(CutCode, Severity.Error, $"The output of rule '{record.RuleId}' was cut: {reason}.")));
        return (record with { Status = RuleRunStatus.Failed, Message = reason, FindingCount = kept.Count }, kept, reason);
    }

    /// <summary>The common case, checked without copying anything: every finding within every limit.</summary>
    private bool Fits(IReadOnlyList<ReportedFinding> findings, int share)
    {
        if (findings.Count > MaxFindingsPerRule) return false;
        long bytes = 0;
        foreach (var reported in findings)
        {
            var finding = reported.Finding;
            if (IsTooLong(finding)) return false;
            bytes += SizeOf(finding);
        }

        return bytes <= share;
    }

    private Finding CutText(Finding finding, ref int longMessages)
    {
        if (!IsTooLong(finding)) return finding;
        longMessages++;
        return new Finding(Cut(finding.Code, MaxMessageChars), finding.Severity, Cut(finding.Message, MaxMessageChars))
        {
            Atoms = finding.Atoms,
            Peaks = finding.Peaks,
            Evidence = [.. finding.Evidence.Select(e => new KeyValuePair<string, string>(Cut(e.Key, MaxMessageChars), Cut(e.Value, MaxMessageChars)))],
        };
    }

    private bool IsTooLong(Finding finding) =>
        finding.Message.Length > MaxMessageChars || finding.Code.Length > MaxMessageChars
        || finding.Evidence.Any(e => e.Key.Length > MaxMessageChars || e.Value.Length > MaxMessageChars);

    /// <summary>Cuts text to <paramref name="max"/> characters, saying how long it was.</summary>
    public static string Cut(string text, int max) => TextCut.Cut(text, max);

    /// <summary>An upper bound of the finding's size on the wire (UTF-8 text, fixed-size numbers, field tags).</summary>
    private static long SizeOf(Finding finding)
    {
        const int perField = 16;
        long size = perField * 4 + Encoding.UTF8.GetByteCount(finding.Code) + Encoding.UTF8.GetByteCount(finding.Message);
        size += finding.Atoms.Count * 8L + finding.Peaks.Count * 48L;
        foreach (var (key, value) in finding.Evidence) size += perField + Encoding.UTF8.GetByteCount(key) + Encoding.UTF8.GetByteCount(value);
        return size;
    }
}
