using System.Diagnostics;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests;

/// <summary>Runs the built command-line tool as a child process, the way a script would.</summary>
internal static class CliProcess
{
    /// <summary>The CLI's output folder, built in the same configuration as the tests.</summary>
    public static string Directory
    {
        get
        {
            var configuration = new DirectoryInfo(AppContext.BaseDirectory.TrimEnd(Path.DirectorySeparatorChar)).Parent!.Name;
            return Path.Combine(RepoPaths.Root, "src", "ConsistencyHost.Cli", "bin", configuration, "net10.0");
        }
    }

    public static async Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(params string[] args)
    {
        var start = new ProcessStartInfo("dotnet")
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            WorkingDirectory = RepoPaths.Root,
        };
        start.ArgumentList.Add(Path.Combine(Directory, "consistencyhost.dll"));
        foreach (var arg in args) start.ArgumentList.Add(arg);
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
