using System.Text;
using ConsistencyHost.Contract.V1;
using static ConsistencyHost.Cli.Batch.Html.SvgText;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>
/// Writes report.html without holding the reports: each entry's section goes to a scratch file as it arrives,
/// and where it lies goes to a second one (<see cref="SectionIndex"/>); in memory stay only counts. At the end
/// the page is assembled: totals and the chart first, then the sections copied worst first.
/// </summary>
internal sealed class HtmlReportWriter : IDisposable
{
    private readonly string _target;
    private readonly string _scratchPath;
    private readonly FileStream _scratch;
    private readonly SectionIndex _index;
    private readonly Dictionary<(string Rule, Severity Severity), int> _totals = [];
    private readonly SectionAnchors _anchors = new();

    public HtmlReportWriter(string target)
    {
        _target = target;
        _scratchPath = target + ".sections.tmp";
        _scratch = new FileStream(_scratchPath, FileMode.Create, FileAccess.ReadWrite, FileShare.None, 1 << 16, FileOptions.DeleteOnClose);
        _index = new SectionIndex(target + ".index.tmp");
    }

    public void Add(BatchItem item, CheckEntryResponse response)
    {
        var bytes = Encoding.UTF8.GetBytes(EntryFragment.Render(item, response, _anchors.Next(response.EntryId)));
        _index.Add(SectionKey.Of(response), _scratch.Position, bytes.Length);
        _scratch.Write(bytes);
        foreach (var finding in response.Findings)
        {
            _totals[(finding.RuleId, finding.Severity)] = _totals.GetValueOrDefault((finding.RuleId, finding.Severity)) + 1;
        }
    }

    public void Complete(string title)
    {
        _scratch.Flush();
        using var output = new FileStream(_target, FileMode.Create, FileAccess.Write);
        using (var head = new StreamWriter(output, new UTF8Encoding(false), leaveOpen: true))
        {
            head.Write($"<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>{E(title)}</title><style>{ReportStyle.Css}</style></head><body>\n");
            head.Write($"<h1>{E(title)}</h1>{Summary()}<h2>Findings by rule and severity</h2>{SeverityChartSvg.Draw(_totals)}<h2>Entries, worst first</h2>\n");
        }

        var buffer = new byte[1 << 16];
        foreach (var (offset, length) in _index.WorstFirst())
        {
            _scratch.Position = offset;
            for (var left = length; left > 0;)
            {
                var read = _scratch.Read(buffer, 0, Math.Min(buffer.Length, left));
                if (read == 0) throw new IOException($"scratch file ended early in the section at offset {offset}");
                output.Write(buffer, 0, read);
                left -= read;
            }
        }

        output.Write(Encoding.UTF8.GetBytes("<footer>Findings are screening aids for a qualified chemist, not a release decision.</footer>\n</body></html>\n"));
    }

    public void Dispose()
    {
        _scratch.Dispose();
        _index.Dispose();
    }

    private string Summary()
    {
        int Count(int rank) => _index.Counts.Where(c => c.Key.Rank == rank).Sum(c => c.Value);
        return $"<div class=\"summary\"><div><b>{_index.Entries}</b>entries</div><div><b>{Count(SectionKey.ErrorRank) + Count(SectionKey.InputRank)}</b>with an error or unreadable</div>"
            + $"<div><b>{Count(2)}</b>worst is a warning</div><div><b>{Count(1)}</b>worst is info</div><div><b>{Count(0)}</b>no findings</div></div>";
    }
}
