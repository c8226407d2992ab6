using System.Globalization;
using System.Text;
using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Cli.Output;

/// <summary>Prints a check report for a person at a terminal.</summary>
internal static class TextReport
{
    public static string Format(CheckEntryResponse response)
    {
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"Entry {response.EntryId} (profile {response.Profile})\n");
        if (response.Structure is { Formula.Length: > 0 } structure)
        {
            text.Append(CultureInfo.InvariantCulture, $"Structure: {structure.Formula}, {structure.HeavyAtoms} heavy atoms, monoisotopic mass {structure.MonoisotopicMass:0.0000}\n");
        }

        text.Append('\n');
        foreach (var finding in response.Findings)
        {
            text.Append(CultureInfo.InvariantCulture, $"  {finding.Severity.ToString().ToUpperInvariant(),-8}{finding.RuleId}/{finding.Code}\n");
            text.Append(CultureInfo.InvariantCulture, $"          {finding.Message}\n");
            if (finding.Evidence.Count > 0)
            {
                text.Append("          evidence: ").AppendJoin(", ", finding.Evidence.Select(e => $"{e.Name}={e.Value}")).Append('\n');
            }
        }

        if (response.Findings.Count == 0) text.Append("  No findings.\n");
        text.Append("\nRule runs:\n");
        foreach (var run in response.RuleRuns)
        {
            var why = run.Message.Length > 0 ? " - " + run.Message : "";
            text.Append(CultureInfo.InvariantCulture, $"  {run.RuleId,-24} {run.Status,-9} {run.ElapsedMs,8:0.000} ms  {run.FindingCount} finding(s){why}\n");
        }

        text.Append('\n').Append(Summary(response)).Append('\n');
        return text.ToString();
    }

    private static string Summary(CheckEntryResponse response)
    {
        int Count(Severity severity) => response.Findings.Count(f => f.Severity == severity);
        var counts = string.Create(CultureInfo.InvariantCulture,
            $"{Count(Severity.Error)} error(s), {Count(Severity.Warning)} warning(s), {Count(Severity.Info)} info.");
        return counts + " Findings are screening aids for a qualified chemist, not a release decision.";
    }
}
