using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Testing.Running;

namespace ConsistencyHost.Sdk.Testing.Assertions;

/// <summary>
/// Assertions on a rule run's findings that work with any test framework: a failure throws
/// <see cref="FindingAssertException"/> whose message lists what the rule did produce.
/// </summary>
public static class FindingAssert
{
    /// <summary>The run ended <see cref="RuleRunStatus.Ok"/> and produced at least one finding with <paramref name="code"/>; returns those findings.</summary>
    public static IReadOnlyList<Finding> HasCode(RuleRun run, string code)
    {
        var matching = Ok(run).Findings.Where(f => f.Code == code).ToList();
        return matching.Count > 0 ? matching : throw Fail(run, $"expected a finding with code '{code}'");
    }

    /// <summary>The run produced exactly one finding with <paramref name="code"/>; returns it.</summary>
    public static Finding HasSingle(RuleRun run, string code)
    {
        var matching = HasCode(run, code);
        return matching.Count == 1 ? matching[0] : throw Fail(run, $"expected one finding with code '{code}', found {matching.Count}");
    }

    /// <summary>The run ended <see cref="RuleRunStatus.Ok"/> without any finding with <paramref name="code"/>.</summary>
    public static void LacksCode(RuleRun run, string code)
    {
        if (Ok(run).Findings.Any(f => f.Code == code)) throw Fail(run, $"expected no finding with code '{code}'");
    }

    /// <summary>The run ended <see cref="RuleRunStatus.Ok"/> with no finding at all.</summary>
    public static void NoFindings(RuleRun run)
    {
        if (Ok(run).Findings.Count > 0) throw Fail(run, "expected no findings");
    }

    private static RuleRun Ok(RuleRun run) =>
        run.Status == RuleRunStatus.Ok ? run : throw Fail(run, $"expected the run to end Ok, but it ended {run.Status}{(run.Error is null ? "" : ": " + run.Error.Message)}");

    private static FindingAssertException Fail(RuleRun run, string expectation)
    {
        var actual = run.Findings.Count == 0
            ? "no findings"
            : string.Join("\n", run.Findings.Select(f => $"  {f.Code} ({f.Severity}): {f.Message}"));
        return new FindingAssertException($"Rule '{run.RuleId}': {expectation}; it produced {actual}");
    }
}
