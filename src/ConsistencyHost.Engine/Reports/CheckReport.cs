using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Engine.Reports;

/// <summary>The engine's answer for one entry.</summary>
public sealed record CheckReport
{
    /// <summary>The entry's id.</summary>
    public required string EntryId { get; init; }

    /// <summary>The profile applied.</summary>
    public required string Profile { get; init; }

    /// <summary>All findings, ordered by rule id then as each rule produced them.</summary>
    public IReadOnlyList<ReportedFinding> Findings { get; init; } = [];

    /// <summary>One record per enabled rule.</summary>
    public IReadOnlyList<RuleRunRecord> RuleRuns { get; init; } = [];

    /// <summary>What was understood of the structure; null when the entry has none.</summary>
    public StructureSummary? Structure { get; init; }

    /// <summary>The highest severity of any finding; null when there is none.</summary>
    public Severity? HighestSeverity => Findings.Count == 0 ? null : Findings.Max(f => f.Finding.Severity);
}

/// <summary>A finding stamped with the rule that produced it, severity already overridden by the profile.</summary>
public sealed record ReportedFinding(string RuleId, string RuleVersion, Finding Finding);

/// <summary>How a rule run ended.</summary>
public enum RuleRunStatus
{
    /// <summary>Ran to completion.</summary>
    Ok = 1,
    /// <summary>Threw; its findings are discarded.</summary>
    Failed = 2,
    /// <summary>Overran its deadline; its findings are discarded.</summary>
    TimedOut = 3,
    /// <summary>Not run.</summary>
    Skipped = 4,
    /// <summary>Its worker process died during the run (stack overflow, out of memory, exit); findings discarded.</summary>
    Crashed = 5,
    /// <summary>Not run: its plugin crashed too often recently and is held back until the window passes.</summary>
    Quarantined = 6,
}

/// <summary>How one rule ran on the entry.</summary>
public sealed record RuleRunRecord(string RuleId, string RuleVersion, RuleRunStatus Status, TimeSpan Elapsed, string Message, int FindingCount);

/// <summary>What the host understood of the structure.</summary>
public sealed record StructureSummary(string Formula, int HeavyAtoms, double MonoisotopicMass);
