using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>
/// The page of a real batch, checked for what a reader meets: one unique element id per entry section (deep links),
/// solvent and water labels whose boxes never overlap (from the SVG coordinates written) and whose text fits its box
/// (measured by Chromium), badges readable (WCAG 2.1 contrast of their computed colours at least 4.5:1), and a
/// findings column that never runs into the plot beside it, even with a long unbroken fragment in a message.
/// </summary>
public sealed partial class HtmlReportLayoutTests : IDisposable
{
    private readonly string _work = Directory.CreateTempSubdirectory("ch-html-layout-").FullName;

    public void Dispose() => Directory.Delete(_work, recursive: true);

    [Fact]
    public async Task Batch_RealNotebook_SectionsHaveUniqueIdsAndLabelsNeverOverlap()
    {
        var (page, lines) = await RunBatchAsync();

        var ids = SectionId().Matches(page).Select(m => m.Groups["id"].Value).ToList();
        Assert.Equal(lines.Length, ids.Count);
        Assert.Equal(ids.Count, ids.Distinct(StringComparer.Ordinal).Count());
        Assert.All(ids, id => Assert.Contains($"<a href=\"#{id}\">", page, StringComparison.Ordinal));
        Assert.Contains("id=\"entry-AIS-LQ-0436\"", page, StringComparison.Ordinal);
        // The repeated entry id keeps a link of its own.
        Assert.Equal(2, ids.Count(id => id.StartsWith("entry-AIS-LQ-0417", StringComparison.Ordinal)));

        var spectra = Regex.Matches(page, "<svg class=\"spectrum\".*?</svg>").Select(m => Boxes(m.Value)).Where(b => b.Count > 0).ToList();
        Assert.NotEmpty(spectra);
        foreach (var boxes in spectra)
        {
            for (var i = 0; i < boxes.Count; i++)
                for (var j = i + 1; j < boxes.Count; j++)
                    Assert.False(boxes[i].Overlaps(boxes[j]), $"label boxes overlap: {boxes[i]} and {boxes[j]}");
        }

        // The DMSO-d6 entry puts CHD2S(O)CD3 2.50 and H2O 3.33 (Fulmer 2010) closer than their labels are wide:
        // the case that needs a second tier was drawn.
        Assert.Contains(spectra, boxes => boxes.Select(b => b.Y).Distinct().Count() > 1);
    }

    [Fact]
    public async Task Batch_RealNotebook_InChromiumBadgesReadLabelsFitAndColumnsDoNotOverlap()
    {
        var (page, _) = await RunBatchAsync();
        var probed = Path.Combine(_work, "probed.html");
        await File.WriteAllTextAsync(probed, page.Replace("</body>", Probe + "</body>", StringComparison.Ordinal));

        var (log, dom) = await HeadlessChromium.ScreenshotAsync(probed, Path.Combine(_work, "probed.png"));

        var json = Regex.Match(dom, "<pre id=\"probe\">(?<json>.*?)</pre>", RegexOptions.Singleline);
        Assert.True(json.Success, "the probe did not run: " + log);
        using var result = JsonDocument.Parse(System.Net.WebUtility.HtmlDecode(json.Groups["json"].Value));
        var badges = result.RootElement.GetProperty("badges").EnumerateArray().ToList();
        Assert.Contains(badges, b => b.GetProperty("text").GetString() == "no findings");
        Assert.All(badges, b => Assert.True(Contrast(b.GetProperty("color").GetString()!, b.GetProperty("background").GetString()!) >= 4.5, b.ToString()));
        Assert.All(result.RootElement.GetProperty("labels").EnumerateArray(), l => Assert.True(l.GetProperty("text").GetDouble() <= l.GetProperty("box").GetDouble(), l.ToString()));
        Assert.All(result.RootElement.GetProperty("sections").EnumerateArray(), s =>
        {
            Assert.True(s.GetProperty("overflow").GetDouble() <= 0, s.ToString());
            Assert.True(s.GetProperty("gap").GetDouble() >= 0, s.ToString());
        });
    }

    // Runs in the page: computed badge colours, each label's text length against its box, and per section how far the
    // findings column's content reaches past its box and the room between the column and the plot when side by side.
    private const string Probe = """
        <script>
        const out = { badges: [], labels: [], sections: [] };
        for (const b of document.querySelectorAll('.badge')) {
          const s = getComputedStyle(b);
          out.badges.push({ text: b.textContent, color: s.color, background: s.backgroundColor });
        }
        for (const g of document.querySelectorAll('.solvent-label')) {
          out.labels.push({ label: g.textContent, text: g.querySelector('text').getComputedTextLength(), box: g.querySelector('rect').width.baseVal.value });
        }
        for (const section of document.querySelectorAll('section.entry')) {
          const f = section.querySelector('.findings'), p = section.querySelector('.plot');
          const fr = f.getBoundingClientRect(), pr = p.getBoundingClientRect();
          const sideBySide = pr.width > 0 && pr.top < fr.bottom && fr.top < pr.bottom;
          out.sections.push({ id: section.id, overflow: f.scrollWidth - f.clientWidth, gap: sideBySide ? pr.left - fr.right : 0 });
        }
        const pre = document.createElement('pre'); pre.id = 'probe'; pre.textContent = JSON.stringify(out); document.body.appendChild(pre);
        </script>
        """;

    private async Task<(string Page, string[] Lines)> RunBatchAsync()
    {
        var entries = Directory.CreateDirectory(Path.Combine(_work, "entries")).FullName;
        foreach (var file in Directory.GetFiles(Path.Combine(RepoPaths.Samples, "entries"), "*.json"))
        {
            File.Copy(file, Path.Combine(entries, Path.GetFileName(file)));
        }

        // The same entry exported twice (a notebook that repeats an id).
        File.Copy(Path.Combine(entries, "AIS-LQ-0417.json"), Path.Combine(entries, "AIS-LQ-0417-copy.json"));
        // 4'-Methoxyacetophenone in DMSO-d6 (shifts typical, from memory), with a pasted line that ends in a long
        // run of characters no reader understands: a lenient read reports it in a finding's message.
        await File.WriteAllTextAsync(Path.Combine(entries, "AIS-LQ-0480.json"), $$"""
            { "entryId": "AIS-LQ-0480", "structure": { "smiles": "COc1ccc(cc1)C(C)=O" },
              "reportedText": [ "1H NMR (400 MHz, DMSO-d6) δ 7.93 (d, J = 8.9 Hz, 2H), 7.04 (d, J = 8.9 Hz, 2H), 3.84 (s, 3H), 2.51 (s, 3H). {{new string('Q', 400)}}" ] }
            """);
        var output = Path.Combine(_work, "out");
        var (exit, stdout, stderr) = await CliProcess.RunAsync("batch", entries, "--out", output);
        Assert.True(exit is 0 or 1, stderr + stdout);
        return (await File.ReadAllTextAsync(Path.Combine(output, "report.html")), await File.ReadAllLinesAsync(Path.Combine(output, "reports.jsonl")));
    }

    private sealed record Box(double X, double Y, double Width, double Height)
    {
        public bool Overlaps(Box other) =>
            X < other.X + other.Width && other.X < X + Width && Y < other.Y + other.Height && other.Y < Y + Height;
    }

    private static List<Box> Boxes(string svg) => [.. LabelBox().Matches(svg).Select(m => new Box(
        D(m.Groups["x"].Value), D(m.Groups["y"].Value), D(m.Groups["w"].Value), D(m.Groups["h"].Value)))];

    private static double D(string text) => double.Parse(text, CultureInfo.InvariantCulture);

    /// <summary>WCAG 2.1 contrast ratio (relative luminance, sRGB) of two CSS rgb()/rgba() colours.</summary>
    private static double Contrast(string a, string b)
    {
        static double Luminance(string css)
        {
            var c = Regex.Matches(css, @"[\d.]+").Take(3).Select(m => D(m.Value) / 255).Select(v => v <= 0.04045 ? v / 12.92 : Math.Pow((v + 0.055) / 1.055, 2.4)).ToArray();
            return 0.2126 * c[0] + 0.7152 * c[1] + 0.0722 * c[2];
        }

        var (la, lb) = (Luminance(a), Luminance(b));
        return (Math.Max(la, lb) + 0.05) / (Math.Min(la, lb) + 0.05);
    }

    [GeneratedRegex("<section class=\"entry [a-z]+\" id=\"(?<id>[^\"]+)\">")]
    private static partial Regex SectionId();

    [GeneratedRegex("<rect class=\"label-box\" x=\"(?<x>[-\\d.]+)\" y=\"(?<y>[-\\d.]+)\" width=\"(?<w>[\\d.]+)\" height=\"(?<h>[\\d.]+)\"/>")]
    private static partial Regex LabelBox();
}
