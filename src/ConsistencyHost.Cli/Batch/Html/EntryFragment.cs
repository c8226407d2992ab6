using System.Text;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Spectra.Model;
using static ConsistencyHost.Cli.Batch.Html.SvgText;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>One entry's section of the report: its findings beside the stick spectrum of its first 1H list.</summary>
internal static class EntryFragment
{
    private static readonly EntryIntake Intake = new(IntakeLimits.Default);

    // anchor: the section's element id, unique on the page (SectionAnchors).
    public static string Render(BatchItem item, CheckEntryResponse response, string anchor)
    {
        var html = new StringBuilder();
        var worst = response.InputError is not null ? "input" : response.HighestSeverity == Severity.Unspecified ? "clean" : SeverityChartSvg.Name(response.HighestSeverity);
        var id = E(anchor);
        html.Append($"<section class=\"entry {worst}\" id=\"{id}\"><h2><span class=\"badge {worst}\">{Label(worst)}</span> <a href=\"#{id}\">{E(response.EntryId)}</a></h2>");
        html.Append($"<p class=\"meta\">{E(item.Source)}{Structure(response)}{(response.Profile.Length > 0 ? $" · profile {E(response.Profile)}" : "")}</p>");
        html.Append("<div class=\"columns\"><div class=\"findings\">").Append(Findings(response)).Append("</div>");
        html.Append("<div class=\"plot\">").Append(Spectrum(item, response)).Append("</div></div></section>\n");
        return html.ToString();
    }

    private static string Label(string worst) => worst switch
    {
        "input" => "unreadable",
        "clean" => "no findings",
        _ => worst,
    };

    private static string Structure(CheckEntryResponse response) =>
        response.Structure is { Formula.Length: > 0 } s ? $" · {E(s.Formula)}, {s.HeavyAtoms} heavy atoms" : "";

    private static string Findings(CheckEntryResponse response)
    {
        if (response.InputError is { } error)
        {
            return $"<p class=\"input-error\"><b>{E(error.Field)}</b>: {E(error.Reason)}</p>";
        }

        if (response.Findings.Count == 0) return "<p class=\"none\">No findings.</p>";
        var table = new StringBuilder("<table><thead><tr><th>severity</th><th>rule / code</th><th>message</th><th>spectrum:signal</th></tr></thead><tbody>");
        foreach (var finding in response.Findings.OrderByDescending(f => f.Severity))
        {
            var peaks = string.Join(", ", finding.Peaks.Select(p => p.Signal < 0 ? $"spectrum {p.Spectrum + 1}" : $"{p.Spectrum + 1}:{p.Signal + 1}"));
            table.Append($"<tr class=\"{SeverityChartSvg.Name(finding.Severity)}\"><td>{SeverityChartSvg.Name(finding.Severity)}</td>");
            table.Append($"<td><code>{E(finding.RuleId)}/{E(finding.Code)}</code></td><td>{E(finding.Message)}</td><td>{E(peaks)}</td></tr>");
        }

        return table.Append("</tbody></table>").ToString();
    }

    private static string Spectrum(BatchItem item, CheckEntryResponse response)
    {
        if (item.Request is null || response.InputError is not null) return "";
        IReadOnlyList<Spectrum> spectra;
        try
        {
            spectra = Intake.Build(SubmissionMapper.ToSubmission(item.Request)).Spectra;
        }
        catch (EntryInputException)
        {
            return "";
        }

        var index = spectra.ToList().FindIndex(s => s.Nucleus == Nucleus.H1 && s.Signals.Count > 0);
        if (index < 0) return "<p class=\"none\">No 1H peak list to draw.</p>";
        var flagged = response.Findings.SelectMany(f => f.Peaks).Where(p => p.Spectrum == index && p.Signal >= 0).Select(p => p.Signal).ToHashSet();
        return StickSpectrumSvg.Draw(spectra[index], flagged) + MultipletStripSvg.Draw(spectra[index], flagged)
            + "<p class=\"legend-note\">Lines reconstructed from the reported list (first order); red: signals a finding names; dashed: residual solvent and water of the stated solvent.</p>";
    }
}
