using System.IO.Compression;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Sdk.Analyzers.Tests;

/// <summary>The SDK package carries the analyzers and code fixes, so plugin authors get them from one reference.</summary>
public sealed class SdkPackageTests
{
    [Fact]
    public async Task Pack_Sdk_ContainsAnalyzersAndCodeFixesUnderAnalyzersFolder()
    {
        var configuration = RepoPaths.Configuration;
        var output = Path.Combine(Path.GetTempPath(), $"ch-pack-{Guid.NewGuid():N}");
        try
        {
            var (exit, stdout, stderr) = await ChildProcess.RunAsync("dotnet",
                ["pack", Path.Combine(RepoPaths.Root, "src", "ConsistencyHost.Sdk", "ConsistencyHost.Sdk.csproj"), "-c", configuration, "--no-build", "-o", output],
                RepoPaths.Root, TimeSpan.FromMinutes(5));
            Assert.True(exit == 0, stdout + stderr);

            using var package = ZipFile.OpenRead(Directory.GetFiles(output, "ConsistencyHost.Sdk.*.nupkg").Single());
            var entries = package.Entries.Select(e => e.FullName).ToList();
            Assert.Contains("analyzers/dotnet/cs/ConsistencyHost.Sdk.Analyzers.dll", entries);
            Assert.Contains("analyzers/dotnet/cs/ConsistencyHost.Sdk.CodeFixes.dll", entries);
            Assert.Contains("lib/net10.0/ConsistencyHost.Sdk.dll", entries);
        }
        finally
        {
            if (Directory.Exists(output)) Directory.Delete(output, recursive: true);
        }
    }
}
