using System.Diagnostics;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>Debian's chromium, headless, as a person's browser would load a report: a screenshot and the console log.</summary>
internal static class HeadlessChromium
{
    private const string Executable = "/usr/bin/chromium";

    public static async Task<(string Log, string Dom)> ScreenshotAsync(string htmlFile, string png)
    {
        Assert.True(File.Exists(Executable), $"{Executable} is missing: install Debian's chromium (tests/setup/debian-packages.sh)");
        var profile = Directory.CreateTempSubdirectory("ch-chromium-").FullName;
        try
        {
            var url = new Uri(htmlFile).AbsoluteUri;
            var (_, _, log) = await RunAsync(profile, $"--screenshot={png}", "--window-size=1280,2000", "--enable-logging=stderr", "--v=0", url);
            var (_, dom, _) = await RunAsync(profile, "--dump-dom", url);
            return (log, dom);
        }
        finally
        {
            Directory.Delete(profile, recursive: true);
        }
    }

    private static async Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(string profile, params string[] args)
    {
        var start = new ProcessStartInfo(Executable) { RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var arg in new[]
        {
            "--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update",
            "--disable-sync", "--no-first-run", $"--user-data-dir={profile}",
        }.Concat(args))
        {
            start.ArgumentList.Add(arg);
        }

        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        using var timeout = new CancellationTokenSource(TimeSpan.FromMinutes(2));
        try
        {
            await process.WaitForExitAsync(timeout.Token);
        }
        catch (OperationCanceledException)
        {
            process.Kill(entireProcessTree: true);
            throw;
        }

        return (process.ExitCode, await stdout, await stderr);
    }
}
