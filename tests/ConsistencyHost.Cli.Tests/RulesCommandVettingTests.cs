using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests;

public sealed class RulesCommandVettingTests
{
    [Fact]
    public async Task Rules_SourcePluginsOneBanned_ListsTheRefusalWithApiAndLoadsTheOther()
    {
        using var folder = PluginFolder.With();
        foreach (var plugin in new[] { "Vetting.Good", "Vetting.ReadsClock" })
        {
            var target = Directory.CreateDirectory(Path.Combine(folder.Path, plugin)).FullName;
            foreach (var file in Directory.EnumerateFiles(Path.Combine(RepoPaths.Root, "tests", "fixtures", "vetting", plugin), "*.cs"))
            {
                File.Copy(file, Path.Combine(target, Path.GetFileName(file)));
            }
        }

        var (exit, stdout, stderr) = await CliProcess.RunAsync("rules", "--plugins", folder.Path);

        Assert.Equal(0, exit);
        Assert.Equal("", stderr);
        var lines = stdout.Split('\n');
        Assert.Contains(lines, line => line.StartsWith("vetting-good", StringComparison.Ordinal) && line.EndsWith(" loaded", StringComparison.Ordinal));
        Assert.Contains(lines, line => line.StartsWith("Vetting.ReadsClock", StringComparison.Ordinal) &&
                                       line.Contains("REFUSED: refused by source vetting: CHSDK2001: 'System.DateTime.Now'", StringComparison.Ordinal));
    }
}
