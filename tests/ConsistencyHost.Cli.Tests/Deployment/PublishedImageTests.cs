using System.Diagnostics;
using System.Net;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Deployment;

/// <summary>
/// The image's two steps without a container daemon: deploy/Dockerfile's own <c>dotnet publish</c> line (read from
/// the file, its output folder moved to a temporary one and its CONFIGURATION argument set to the configuration
/// these tests were built in, so that the build is incremental), then the published host started with the
/// Dockerfile's ENTRYPOINT on loopback with free ports and the ConfigMap's configuration, and probed.
/// </summary>
public sealed class PublishedImageTests
{
    // A hang guard, not a speed target: a Release publish competes with the other test assemblies for the 2 cores
    // and took 87 s wall (16 s CPU) and up to 3.5 min under that load while being correct, so 90 s failed spuriously.
    private static readonly TimeSpan PublishLimit = TimeSpan.FromMinutes(6);

    [Fact]
    public void Dockerfile_StagesUserAndEntrypoint_AreTheDocumentedOnes()
    {
        var dockerfile = DockerfileSpec.Load();

        Assert.Contains("FROM mcr.microsoft.com/dotnet/sdk:10.0 AS build", dockerfile.Text, StringComparison.Ordinal);
        Assert.Contains("FROM mcr.microsoft.com/dotnet/aspnet:10.0 AS runtime", dockerfile.Text, StringComparison.Ordinal);
        Assert.Contains("USER $APP_UID", dockerfile.Text, StringComparison.Ordinal);
        // Directories r-x, files r-- for everyone: nothing in /app is group- or world-writable.
        Assert.Contains("-type d -exec chmod 0555", dockerfile.Text, StringComparison.Ordinal);
        Assert.Contains("-type f -exec chmod 0444", dockerfile.Text, StringComparison.Ordinal);
        Assert.Equal(["dotnet", "consistencyhost.dll", "serve"], dockerfile.Entrypoint.Take(3));
        Assert.Equal(["dotnet", "publish"], dockerfile.PublishCommand.Take(2));
    }

    [Fact]
    public async Task PublishedHost_DockerfilePublishLineAndEntrypoint_IsReadyWithEveryBuiltInRule()
    {
        var dockerfile = DockerfileSpec.Load();
        var output = Directory.CreateTempSubdirectory("ch-publish-").FullName;
        try
        {
            var command = dockerfile.PublishCommandFor(new Dictionary<string, string> { ["CONFIGURATION"] = RepoPaths.Configuration }, output);
            var (exit, log) = await RunAsync(command);
            Assert.True(exit == 0, $"{string.Join(' ', command)} failed:\n{log}");
            Assert.True(File.Exists(Path.Combine(output, "worker", "ConsistencyHost.Worker.dll")), "the rule worker is published in worker/");

            using var config = ConfigMapFile.Write(await Manifests.LoadAsync());
            using var host = await HostProcess.StartAsync(output, [.. dockerfile.Entrypoint, "--port", "0", "--http-port", "0", "--config", config.Path]);
            var (status, body) = await ProbeTests.GetAsync(host.Http, "/health/ready");

            Assert.Equal(HttpStatusCode.OK, status);
            var plugins = body.GetProperty("checks").EnumerateArray().Single(c => c.GetProperty("name").GetString() == "plugins");
            Assert.Equal("Healthy", plugins.GetProperty("status").GetString());
            Assert.Equal(
                ["coupling-partners", "integral-ratio", "mass-formula", "shift-plausibility", "signal-count", "solvent-residual", "spectrum-metadata"],
                plugins.GetProperty("data").EnumerateObject().Select(p => p.Name).Order(StringComparer.Ordinal));
        }
        finally
        {
            Directory.Delete(output, recursive: true);
        }
    }

    /// <summary>Runs the command from the repository root (the Dockerfile's WORKDIR /src holds the repository).</summary>
    private static async Task<(int ExitCode, string Log)> RunAsync(IReadOnlyList<string> command)
    {
        var start = new ProcessStartInfo(command[0]) { RedirectStandardOutput = true, RedirectStandardError = true, WorkingDirectory = RepoPaths.Root };
        foreach (var word in command.Skip(1)) start.ArgumentList.Add(word);
        // No MSBuild node outlives the test (the environment, not the command line, so the command stays the Dockerfile's).
        start.Environment["MSBUILDDISABLENODEREUSE"] = "1";
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        using var limit = new CancellationTokenSource(PublishLimit);
        try
        {
            await process.WaitForExitAsync(limit.Token);
        }
        catch (OperationCanceledException)
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"publish did not finish within {PublishLimit.TotalSeconds:0} s");
        }

        return (process.ExitCode, await stdout + await stderr);
    }
}
