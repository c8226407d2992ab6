using System.Text.Json;
using System.Text.RegularExpressions;
using ConsistencyHost.Cli.Tests.Batch;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests;

/// <summary>
/// A new user's path through the README, each step taken as written there: serve, call the JSON endpoint with
/// the real curl from samples/clients/curl.md, run the batch over the samples, open its HTML page in a browser.
/// Only ports and the output folder are swapped for free ones, so the tests can run beside each other.
/// </summary>
public sealed partial class ReadmeWalkthroughTests : IDisposable
{
    private const string Curl = "/usr/bin/curl";
    private readonly string _work = Directory.CreateTempSubdirectory("ch-readme-").FullName;

    [GeneratedRegex(@"^dotnet run --project src/ConsistencyHost.Cli -- (serve [^\n]+)$", RegexOptions.Multiline)]
    private static partial Regex ReadmeServe();

    [GeneratedRegex(@"^dotnet run --project src/ConsistencyHost.Cli -- (batch [^\n]+)$", RegexOptions.Multiline)]
    private static partial Regex ReadmeBatch();

    [GeneratedRegex(@"```sh\n(curl -sS -X POST [^`]+?)```", RegexOptions.Singleline)]
    private static partial Regex CurlCheck();

    [Fact]
    public async Task Walkthrough_ServeThenCurlFromSamples_ReturnsTheReportWithTheSolventFinding()
    {
        Assert.True(ReadmeServe().IsMatch(await ReadAsync("README.md")), "README has no serve command");
        Assert.True(File.Exists(Curl), $"{Curl} is missing: install Debian's curl (tests/setup/debian-packages.sh)");
        var curlDoc = await ReadAsync(Path.Combine("samples", "clients", "curl.md"));
        var command = CurlCheck().Match(curlDoc);
        Assert.True(command.Success, "samples/clients/curl.md has no curl POST command");
        await File.WriteAllTextAsync(Path.Combine(_work, "entry.json"), DocBlocks.Json(curlDoc)[0]);
        using var host = await ServeProcess.StartAsync();

        // The documented command with the documented port swapped for this host's; run by a shell like a user's.
        var line = command.Groups[1].Value.Replace("\\\n", " ", StringComparison.Ordinal).Trim()
            .Replace("http://127.0.0.1:5152", host.Http.ToString().TrimEnd('/'), StringComparison.Ordinal);
        var (exit, stdout, stderr) = await ChildProcess.RunAsync("/bin/sh", ["-c", line], _work);

        Assert.True(exit == 0, $"curl exited {exit}: {stderr}");
        using var reply = JsonDocument.Parse(stdout);
        Assert.Equal("AIS-LQ-0436", reply.RootElement.GetProperty("entryId").GetString());
        // Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (CHCl3 in CDCl3 at 7.26 ppm); the
        // sample lists that line as a compound signal on purpose.
        Assert.Contains(reply.RootElement.GetProperty("findings").EnumerateArray(),
            f => f.GetProperty("ruleId").GetString() == "solvent-residual");
    }

    [Fact]
    public async Task Walkthrough_BatchOverSamples_WritesReportsAndAPageThatLoadsInChromium()
    {
        var command = ReadmeBatch().Match(await ReadAsync("README.md"));
        Assert.True(command.Success, "README has no batch command");
        var args = command.Groups[1].Value.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var outIndex = Array.IndexOf(args, "--out");
        Assert.True(outIndex >= 0 && outIndex + 1 < args.Length, "the README's batch command names no --out folder");
        args[outIndex + 1] = Path.Combine(_work, "out");

        var (exit, _, stderr) = await CliProcess.RunAsync(args);

        Assert.True(exit is 0 or 1, stderr);
        var entries = Directory.GetFiles(Path.Combine(RepoPaths.Samples, "entries"), "*.json").Length;
        var reports = await File.ReadAllLinesAsync(Path.Combine(_work, "out", "reports.jsonl"));
        Assert.Equal(entries, reports.Count(l => l.Length > 0));
        var png = Path.Combine(_work, "report.png");
        var (log, dom) = await HeadlessChromium.ScreenshotAsync(Path.Combine(_work, "out", "report.html"), png);
        Assert.DoesNotContain("Uncaught", log, StringComparison.Ordinal);
        Assert.Contains("<svg", dom, StringComparison.Ordinal);
        Assert.True(File.Exists(png), "chromium wrote no screenshot");
    }

    public void Dispose() => Directory.Delete(_work, recursive: true);

    private static Task<string> ReadAsync(string relativePath) => File.ReadAllTextAsync(Path.Combine(RepoPaths.Root, relativePath));
}
