namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>The report's inline style sheet (the page loads nothing from the network).</summary>
internal static class ReportStyle
{
    public const string Css = """
        body { font: 14px/1.4 system-ui, sans-serif; margin: 24px; color: #1d232a; background: #fff; }
        h1 { font-size: 22px; margin: 0 0 4px; }
        h2 { font-size: 16px; margin: 0 0 4px; }
        .summary { display: flex; gap: 16px; margin: 12px 0 20px; flex-wrap: wrap; }
        .summary div { border: 1px solid #d5dbe1; border-radius: 6px; padding: 8px 14px; }
        .summary b { display: block; font-size: 20px; }
        .entry { border: 1px solid #d5dbe1; border-left: 6px solid #9aa5b1; border-radius: 6px; padding: 10px 14px; margin: 14px 0; }
        .entry.error, .entry.input { border-left-color: #c62828; }
        .entry.warning { border-left-color: #e69a00; }
        .entry.info { border-left-color: #2f6fb3; }
        .entry.clean { border-left-color: #2e7d32; }
        .entry h2 a { color: inherit; text-decoration: none; } .entry h2 a:hover { text-decoration: underline; }
        /* White on these four backgrounds is at least 4.5:1 (WCAG 2.1 contrast, AA for normal text); the page test computes it. */
        .badge { font-size: 12px; font-weight: 600; text-transform: uppercase; padding: 1px 6px; border-radius: 4px; color: #fff; background: #5b6673; vertical-align: middle; }
        .badge.error, .badge.input { background: #c62828; } .badge.warning { background: #8a5a00; } .badge.info { background: #2f6fb3; } .badge.clean { background: #2e7d32; }
        .meta { color: #56616d; margin: 0 0 8px; }
        .columns { display: flex; gap: 16px; align-items: flex-start; flex-wrap: wrap; }
        /* min-width 0 and breaks anywhere: a long unbroken token (a quoted fragment, a code) wraps inside the column
           instead of widening it past the plot beside it. */
        .findings { flex: 1 1 420px; min-width: 0; overflow-wrap: anywhere; }
        .plot { flex: 0 1 620px; min-width: 0; }
        table { border-collapse: collapse; width: 100%; font-size: 13px; table-layout: fixed; }
        th, td { text-align: left; vertical-align: top; padding: 4px 6px; border-bottom: 1px solid #e6eaee; overflow-wrap: anywhere; }
        th:nth-child(1) { width: 64px; } th:nth-child(2) { width: 28%; } th:nth-child(4) { width: 72px; }
        tr.error td:first-child { color: #c62828; font-weight: 600; } tr.warning td:first-child { color: #b97800; font-weight: 600; }
        tr.info td:first-child { color: #2f6fb3; }
        .input-error { color: #c62828; }
        .none, .legend-note { color: #56616d; font-size: 12px; }
        svg text { font: 11px system-ui, sans-serif; fill: #1d232a; }
        .spectrum { width: 100%; max-width: 620px; height: auto; border: 1px solid #e6eaee; }
        .axis, .tick { stroke: #56616d; stroke-width: 1; }
        .tick-label { text-anchor: middle; fill: #56616d; }
        .caption { fill: #56616d; }
        .peak line { stroke: #1d232a; stroke-width: 1.2; } .peak rect { fill: #8795a3; fill-opacity: 0.55; }
        .peak.flagged line { stroke: #c62828; stroke-width: 1.6; } .peak.flagged rect { fill: #c62828; fill-opacity: 0.45; }
        .marker { fill: #c62828; }
        .solvent { stroke: #2f6fb3; stroke-width: 1; stroke-dasharray: 4 3; }
        .solvent-label text { fill: #2f6fb3; text-anchor: middle; font-size: 10px; } .label-box { fill: #fff; }
        .strip { display: flex; flex-wrap: wrap; gap: 4px; margin-top: 4px; }
        .multiplet { width: 96px; height: 70px; border: 1px solid #e6eaee; }
        .multiplet .stick { stroke: #1d232a; stroke-width: 1.2; } .multiplet.flagged .stick { stroke: #c62828; }
        .multiplet text { font-size: 8px; }
        .chart { width: 100%; max-width: 700px; height: auto; }
        .bar.error { fill: #c62828; } .bar.warning { fill: #e69a00; } .bar.info { fill: #2f6fb3; }
        .bar-count { fill: #fff; text-anchor: middle; font-weight: 600; }
        .rule-label { text-anchor: end; } .row-total { fill: #56616d; }
        footer { color: #56616d; font-size: 12px; margin-top: 24px; }
        """;
}
