using System.Text;
using ConsistencyHost.Contract.V1;
using static ConsistencyHost.Cli.Batch.Html.SvgText;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>Horizontal stacked bars: findings per rule, split by severity, with counts and a legend.</summary>
internal static class SeverityChartSvg
{
    private const double LabelWidth = 170, BarWidth = 420, RowHeight = 26, TopMargin = 28;
    private static readonly Severity[] Order = [Severity.Error, Severity.Warning, Severity.Info];

    public static string Draw(IReadOnlyDictionary<(string Rule, Severity Severity), int> totals)
    {
        var rules = totals.Keys.Select(k => k.Rule).Distinct().Order(StringComparer.Ordinal).ToList();
        if (rules.Count == 0) return "<p class=\"none\">No findings in this batch.</p>";
        int Count(string rule, Severity severity) => totals.GetValueOrDefault((rule, severity));
        var largest = rules.Max(r => Order.Sum(s => Count(r, s)));
        var height = TopMargin + rules.Count * RowHeight + 10;
        var svg = new StringBuilder($"<svg class=\"chart\" xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 {N(LabelWidth + BarWidth + 60)} {N(height)}\" role=\"img\" aria-label=\"findings by rule and severity\">");
        Legend(svg);
        for (var row = 0; row < rules.Count; row++)
        {
            var y = TopMargin + row * RowHeight;
            svg.Append($"<text class=\"rule-label\" x=\"{N(LabelWidth - 8)}\" y=\"{N(y + 16)}\">{E(rules[row])}</text>");
            var x = LabelWidth;
            foreach (var severity in Order)
            {
                var count = Count(rules[row], severity);
                if (count == 0) continue;
                var width = count * BarWidth / largest;
                svg.Append($"<rect class=\"bar {Name(severity)}\" x=\"{N(x)}\" y=\"{N(y + 3)}\" width=\"{N(width)}\" height=\"{N(RowHeight - 8)}\"><title>{E(rules[row])}: {count} {Name(severity)}</title></rect>");
                if (width >= 18) svg.Append($"<text class=\"bar-count\" x=\"{N(x + width / 2)}\" y=\"{N(y + 16)}\">{count}</text>");
                x += width;
            }

            svg.Append($"<text class=\"row-total\" x=\"{N(x + 6)}\" y=\"{N(y + 16)}\">{Order.Sum(s => Count(rules[row], s))}</text>");
        }

        return svg.Append("</svg>").ToString();
    }

    public static string Name(Severity severity) => severity switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        Severity.Info => "info",
        _ => "none",
    };

    private static void Legend(StringBuilder svg)
    {
        var x = LabelWidth;
        foreach (var severity in Order)
        {
            svg.Append($"<rect class=\"bar {Name(severity)}\" x=\"{N(x)}\" y=\"6\" width=\"12\" height=\"12\"/>");
            svg.Append($"<text class=\"legend\" x=\"{N(x + 16)}\" y=\"16\">{Name(severity)}</text>");
            x += 90;
        }
    }
}
