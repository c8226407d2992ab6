using System.Text.RegularExpressions;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>Lines of reports.jsonl made comparable between two runs.</summary>
internal static partial class ReportLines
{
    /// <summary>
    /// The line with each rule's elapsed time set to 0 and the request id left out: both differ from run to run, and
    /// only a report made by a host carries the request id of its call (the embedded engine's have none).
    /// </summary>
    public static string WithoutRunDetails(string line) => RequestId().Replace(Elapsed().Replace(line, "\"elapsedMs\": 0"), "");

    [GeneratedRegex("\"elapsedMs\": [0-9.eE+-]+")]
    private static partial Regex Elapsed();

    [GeneratedRegex(", \"requestId\": \"[^\"]*\"")]
    private static partial Regex RequestId();
}
