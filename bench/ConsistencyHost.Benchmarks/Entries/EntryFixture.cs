using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Entries;

namespace ConsistencyHost.Benchmarks.Entries;

/// <summary>The engine over the built plugins, and the entry mix read once with every lazy analysis computed.</summary>
public sealed class EntryFixture
{
    private EntryFixture(CheckEngine engine, Entry[] entries)
    {
        Engine = engine;
        Entries = entries;
    }

    /// <summary>The embedded engine with the built-in rules (artifacts/plugins) and the default profile.</summary>
    public CheckEngine Engine { get; }

    /// <summary>The mix after intake, perception and interpretation (warm: rules only read them).</summary>
    public Entry[] Entries { get; }

    /// <summary>Builds the engine, checks that every rule loads and runs to completion on every entry.</summary>
    public static EntryFixture Create()
    {
        var engine = CreateEngine();
        // The first check of each entry runs cold (JIT) and may overrun a rule deadline on a loaded machine;
        // it is reported, not fatal. The second, warm check must run every rule to completion.
        foreach (var submission in EntryMix.All) Report("cold", engine.Check(submission));
        foreach (var submission in EntryMix.All) Verify(engine.Check(submission));
        var intake = new EntryIntake(IntakeLimits.Default);
        var entries = EntryMix.All.Select(intake.Build).ToArray();
        foreach (var entry in entries) Warm(entry);
        return new EntryFixture(engine, entries);
    }

    /// <summary>The rule ids of the default profile, in run order.</summary>
    public static IEnumerable<string> RuleIds() => CreateEngine().GetProfile(null).Rules.Select(r => r.Descriptor.Id);

    private static CheckEngine CreateEngine()
    {
        var engine = new CheckEngine(new EngineOptions { PluginsPath = RepoPaths.Plugins });
        var refused = engine.Rules.Where(r => !r.IsLoaded).Select(r => $"{r.Id}: {r.LoadMessage}").ToList();
        if (engine.Rules.Count == 0 || refused.Count > 0)
        {
            throw new InvalidOperationException($"plugins in {RepoPaths.Plugins} not usable (build the plugins first): {string.Join("; ", refused)}");
        }

        return engine;
    }

    private static void Report(string pass, CheckReport report)
    {
        var slowest = report.RuleRuns.MaxBy(r => r.Elapsed)!;
        var bad = report.RuleRuns.Where(r => r.Status != RuleRunStatus.Ok).Select(r => $"{r.RuleId} {r.Status}");
        Console.WriteLine($"// {pass} check {report.EntryId}: slowest rule run {slowest.RuleId} {slowest.Elapsed.TotalMilliseconds:F1} ms; not ok: [{string.Join(", ", bad)}]");
    }

    private static void Verify(CheckReport report)
    {
        var bad = report.RuleRuns.Where(r => r.Status != RuleRunStatus.Ok).Select(r => $"{r.RuleId} {r.Status} {r.Message}").ToList();
        if (bad.Count > 0) throw new InvalidOperationException($"{report.EntryId}: {string.Join("; ", bad)}");
        Console.WriteLine($"// {report.EntryId}: {report.RuleRuns.Count} rules, {report.Findings.Count} findings");
    }

    private static void Warm(Entry entry)
    {
        _ = entry.Perception!.Formula;
        _ = entry.Perception.Equivalence;
        for (var i = 0; i < entry.Spectra.Count; i++)
        {
            if (entry.Analysis.Protons(i) is not { Assignment: { } a }) continue;
            // Printed so a run shows when the assignment search ran out of budget (that dominates its time).
            Console.WriteLine($"// {entry.EntryId}: {entry.Perception.Equivalence.HydrogenClasses.Length} H classes, "
                + $"{entry.Spectra[i].Signals.Count} signals, assignment cost {a.Cost}, exhaustive {a.IsExhaustive}");
        }
    }
}
