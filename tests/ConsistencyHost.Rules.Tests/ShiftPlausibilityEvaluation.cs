using ConsistencyHost.Sdk.Findings;
using Xunit.Abstractions;

namespace ConsistencyHost.Rules.Tests;

/// <summary>
/// Measures the shift-plausibility rule on real author text (Fixtures/published-si-entries.tsv) and on the
/// positional isomers drawn for the same text (Fixtures/positional-isomers.tsv, built with RDKit). Prints
/// entries read, clean entries with a false error / false warning, and isomers caught; the figures go to
/// docs/spectrum-model.md. Asserts the hard target only: no false error on the published entries.
/// </summary>
public sealed class ShiftPlausibilityEvaluation(ITestOutputHelper output)
{
    private const string RuleId = "shift-plausibility";

    [Fact]
    public void PublishedEntriesAndIsomers_Figures()
    {
        var entries = Rows("published-si-entries.tsv").ToDictionary(c => c[0], c => (Smiles: c[3], Text: c[4]));
        var falseErrors = new List<string>();
        var falseWarnings = new List<string>();
        var flaggedClean = new HashSet<string>();
        var unreadable = new HashSet<string>();
        foreach (var (id, entry) in entries)
        {
            if (Findings(entry.Smiles, entry.Text) is not { } findings)
            {
                unreadable.Add(id);
                continue;
            }

            if (findings.Any(f => f.Severity == Severity.Error)) falseErrors.Add(id + ": " + findings.First(f => f.Severity == Severity.Error).Message);
            else if (findings.Any(f => f.Severity == Severity.Warning)) falseWarnings.Add(id + ": " + findings.First(f => f.Severity == Severity.Warning).Message);
            if (findings.Any(f => f.Severity >= Severity.Warning)) flaggedClean.Add(id);
        }

        var isomers = Rows("positional-isomers.tsv").ToList();
        var usable = isomers.Where(c => !flaggedClean.Contains(c[0]) && !unreadable.Contains(c[0])).ToList();
        var caught = usable.Count(c => Findings(c[1], entries[c[0]].Text)?.Any(f => f.Severity >= Severity.Warning) == true);
        var judged = usable.Count;
        // The same isomers against every built-in rule: caught when the isomer draws a warning or error (rule and
        // code) that the drawn structure does not (coupling trees, counts and windows together).
        var caughtByAny = usable.Count(c => WarningCodes(c[1], entries[c[0]].Text).Except(WarningCodes(entries[c[0]].Smiles, entries[c[0]].Text)).Any());
        var read = entries.Count - unreadable.Count;
        output.WriteLine($"entries: {entries.Count}; read: {read}; false error: {falseErrors.Count}; false warning: {falseWarnings.Count} ({100.0 * falseWarnings.Count / read:0.0}%)");
        output.WriteLine($"isomers judged (entry itself clean): {judged}; caught (warning or error): {caught} ({100.0 * caught / Math.Max(1, judged):0.0}%)");
        output.WriteLine($"isomers caught by any built-in rule (a warning or error the drawn structure does not draw): {caughtByAny} ({100.0 * caughtByAny / Math.Max(1, judged):0.0}%)");
        foreach (var line in falseErrors.Concat(falseWarnings)) output.WriteLine(line);
        Assert.True(entries.Count > 200, "fixture read");
        Assert.True(falseErrors.Count == 0, string.Join("\n", falseErrors));
    }

    // Author text the intake cannot read whole (a text-unreadable finding, e.g. PDF glyphs such as "J ) 5.5") is
    // counted as not read: a partly read list is not a fair test of the windows.
    private static List<Finding>? Findings(string smiles, string text)
    {
        var report = BuiltInRules.Engine.Check(new ConsistencyHost.Engine.Intake.EntrySubmission
        {
            EntryId = "AIS-LQ-EVAL",
            Structure = new ConsistencyHost.Sdk.Entries.StructureSource(ConsistencyHost.Sdk.Entries.StructureFormat.Smiles, smiles),
            ReportedText = [text],
        });
        if (report.Findings.Any(f => f.Finding.Code == "text-unreadable")) return null;
        return [.. report.Findings.Where(f => f.RuleId == RuleId).Select(f => f.Finding)];
    }

    private static HashSet<string> WarningCodes(string smiles, string text) =>
    [
        .. BuiltInRules.Check(smiles, text).Findings
            .Where(f => f.Finding.Severity >= Severity.Warning && f.RuleId != "reported-text")
            .Select(f => f.RuleId + "/" + f.Finding.Code),
    ];

    private static IEnumerable<string[]> Rows(string file) =>
        File.ReadLines(Path.Combine(AppContext.BaseDirectory, "Fixtures", file))
            .Where(line => line.Length > 0 && !line.StartsWith('#'))
            .Select(line => line.Split('\t'));
}
