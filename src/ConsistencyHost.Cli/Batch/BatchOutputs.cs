using System.Text;
using ConsistencyHost.Cli.Batch.Html;
using ConsistencyHost.Cli.Output;
using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Cli.Batch;

/// <summary>reports.jsonl (one proto-JSON report per line, flushed as it goes) and report.html.</summary>
internal sealed class BatchOutputs : IDisposable
{
    public const string JsonLinesName = "reports.jsonl";
    public const string HtmlName = "report.html";

    private readonly StreamWriter _jsonLines;
    private readonly HtmlReportWriter _html;

    public BatchOutputs(string folder)
    {
        Directory.CreateDirectory(folder);
        _jsonLines = new StreamWriter(Path.Combine(folder, JsonLinesName), append: false, new UTF8Encoding(false));
        _html = new HtmlReportWriter(Path.Combine(folder, HtmlName));
    }

    public int Entries { get; private set; }

    public int WithErrors { get; private set; }

    public void Add(BatchItem item, CheckEntryResponse response)
    {
        _jsonLines.Write(JsonOutput.Format(response));
        _jsonLines.Write('\n');
        _html.Add(item, response);
        Entries++;
        if (response.InputError is not null || response.HighestSeverity == Severity.Error) WithErrors++;
    }

    public void Complete(string title)
    {
        _jsonLines.Flush();
        _html.Complete(title);
    }

    public void Dispose()
    {
        _jsonLines.Dispose();
        _html.Dispose();
    }
}
