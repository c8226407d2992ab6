using System.Diagnostics;

namespace ConsistencyHost.Tests.Shared;

/// <summary>Runs a program as a child process with a hard time limit, capturing both output streams.</summary>
internal static class ChildProcess
{
    public static async Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(
        string file, IEnumerable<string> args, string? workingDirectory = null, TimeSpan? timeout = null,
        IReadOnlyDictionary<string, string>? environment = null)
    {
        var start = new ProcessStartInfo(file)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            WorkingDirectory = workingDirectory ?? Environment.CurrentDirectory,
        };
        foreach (var arg in args) start.ArgumentList.Add(arg);
        foreach (var (name, value) in environment ?? new Dictionary<string, string>()) start.Environment[name] = value;
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        using var limit = new CancellationTokenSource(timeout ?? TimeSpan.FromMinutes(2));
        try
        {
            await process.WaitForExitAsync(limit.Token);
        }
        catch (OperationCanceledException)
        {
            process.Kill(entireProcessTree: true);
            throw;
        }

        return (process.ExitCode, await stdout, await stderr);
    }
}
