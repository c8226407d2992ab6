using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>The batch command over the bundled samples and over an SD file written by RDKit.</summary>
public sealed partial class BatchCommandTests : IDisposable
{
    private readonly string _out = Directory.CreateTempSubdirectory("ch-batch-").FullName;

    public void Dispose() => Directory.Delete(_out, recursive: true);

    [Fact]
    public async Task Batch_SampleEntries_WritesOneReportLinePerEntryAndAPage()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("batch", Path.Combine(RepoPaths.Samples, "entries"), "--out", _out);

        Assert.True(exit == 0, stderr);
        Assert.Contains("3 entries, 0 with an error", stdout, StringComparison.Ordinal);
        Assert.Matches(@"batch: 3/3 entries, [0-9.]+ entries/s, ETA \d\d:\d\d:\d\d", stderr);
        var ids = File.ReadLines(Path.Combine(_out, "reports.jsonl")).Select(line =>
        {
            using var json = JsonDocument.Parse(line);
            return json.RootElement.GetProperty("entryId").GetString();
        });
        Assert.Equal(["AIS-LQ-0417", "AIS-LQ-0422", "AIS-LQ-0436"], ids);
        var html = await File.ReadAllTextAsync(Path.Combine(_out, "report.html"));
        // Loads nothing: no source or link out of the page (links to its own sections, href="#…", load nothing).
        Assert.DoesNotMatch(@"\bsrc\s*=|\bhref\s*=\s*""(?!#)|url\(|@import", html);
        // Worst first: the two entries with warnings before the clean one.
        Assert.True(html.IndexOf("AIS-LQ-0417</a></h2>", StringComparison.Ordinal) > html.IndexOf("AIS-LQ-0422</a></h2>", StringComparison.Ordinal));
        Assert.True(html.IndexOf("AIS-LQ-0422</a></h2>", StringComparison.Ordinal) > 0);
    }

    [Fact]
    public async Task Batch_PublicationProfile_ExitsOneAndPageLoadsInChromiumWithoutConsoleErrors()
    {
        var config = Path.Combine(RepoPaths.Samples, "profiles", "publication.json");
        var (exit, _, stderr) = await CliProcess.RunAsync("batch", Path.Combine(RepoPaths.Samples, "entries"), "--out", _out, "--config", config);
        var png = Path.Combine(_out, "report.png");

        var (log, dom) = await HeadlessChromium.ScreenshotAsync(Path.Combine(_out, "report.html"), png);

        Assert.True(exit == 1, stderr);
        Assert.DoesNotContain("CONSOLE", log, StringComparison.Ordinal);
        Assert.True(new FileInfo(png).Length > 50_000, $"screenshot is only {new FileInfo(png).Length} bytes");
        Assert.Equal(3, Regex.Count(dom, "<section class=\"entry "));
        Assert.StartsWith("<section class=\"entry error\"", dom[dom.IndexOf("<section", StringComparison.Ordinal)..], StringComparison.Ordinal);
        // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 — residual CHCl3 7.26, water 1.56 in CDCl3.
        Assert.Contains(">CHCl3 7.26</text>", dom, StringComparison.Ordinal);
        Assert.Contains(">H2O 1.56</text>", dom, StringComparison.Ordinal);
        Assert.Contains("<g class=\"peak flagged\">", dom, StringComparison.Ordinal);
    }

    // Issue 13: batch reads reported text leniently (the fragment becomes a finding beside the other rules'); --strict
    // refuses the entry. "zz" is not a multiplicity (docs/spectra.md vocabulary); no solvent is stated.
    [Fact]
    public async Task Batch_UnreadableFragment_IsAFindingUnlessStrict()
    {
        var input = Directory.CreateDirectory(Path.Combine(_out, "in")).FullName;
        await File.WriteAllTextAsync(Path.Combine(input, "AIS-LQ-E013.json"), JsonSerializer.Serialize(new
        {
            entryId = "AIS-LQ-E013",
            structure = new { smiles = "CC(=O)c1ccc(C)cc1" },
            reportedText = new[] { "1H NMR (400 MHz) δ 7.86 (d, J = 8.2 Hz, 2H), 7.26 (zz, 2H), 2.57 (s, 3H), 2.41 (s, 3H)." },
        }));
        var lenientOut = Path.Combine(_out, "lenient");
        var strictOut = Path.Combine(_out, "strict");

        var (_, lenientStdout, lenientStderr) = await CliProcess.RunAsync("batch", input, "--out", lenientOut);
        var (_, strictStdout, strictStderr) = await CliProcess.RunAsync("batch", input, "--out", strictOut, "--strict");

        Assert.Contains("1 entries, 0 with an error", lenientStdout, StringComparison.Ordinal);
        using var report = JsonDocument.Parse(File.ReadLines(Path.Combine(lenientOut, "reports.jsonl")).Single());
        var codes = report.RootElement.GetProperty("findings").EnumerateArray().Select(f => f.GetProperty("code").GetString()).ToList();
        Assert.True(codes.Contains("text-unreadable") && codes.Contains("solvent-not-stated"), string.Join(", ", codes) + lenientStderr);
        Assert.True(strictStdout.Contains("1 entries, 1 with an error", StringComparison.Ordinal), strictStdout + strictStderr);
    }

    [Fact]
    public async Task Batch_Quartet_IsDrawnWithBinomialIntensities()
    {
        await CliProcess.RunAsync("batch", Path.Combine(RepoPaths.Samples, "entries"), "--out", _out);
        var html = await File.ReadAllTextAsync(Path.Combine(_out, "report.html"));

        // The OCH2 quartet of ethyl 4-aminobenzoate (AIS-LQ-0417, 4.31 q, J = 7.1 Hz).
        var quartet = MultipletSvg().Matches(html).Select(m => m.Value).Single(svg => svg.Contains(">4.31 q (7.1 Hz)<", StringComparison.Ordinal));
        var heights = StickTop().Matches(quartet).Select(m => 50 - double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture)).ToList();

        // Common practice: n equivalent neighbours give n+1 lines in the ratio of Pascal's triangle, 1:3:3:1 for n = 3.
        Assert.Equal(4, heights.Count);
        Assert.Equal([1.0, 3.0, 3.0, 1.0], heights.Select(h => Math.Round(h / heights.Min(), 2)));
    }

    [GeneratedRegex("<svg class=\"multiplet[^\"]*\".*?</svg>", RegexOptions.Singleline)]
    private static partial Regex MultipletSvg();

    [GeneratedRegex("class=\"stick\" x1=\"[^\"]+\" y1=\"50\" x2=\"[^\"]+\" y2=\"([0-9.]+)\"")]
    private static partial Regex StickTop();
}
