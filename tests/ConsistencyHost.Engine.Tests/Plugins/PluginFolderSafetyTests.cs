using System.Runtime.Versioning;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Plugins.Safety;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Plugins;

/// <summary>
/// A plugin folder that others than the host's user could change is refused at start, every offending path
/// named with its mode, owner and the fix. Modes are set with chmod semantics (File.SetUnixFileMode), so no
/// test depends on the machine's umask.
/// </summary>
[SupportedOSPlatform("linux")]
public sealed class PluginFolderSafetyTests
{
    private const string Plugin = "ConsistencyHost.Rules.SpectrumMetadata";

    [Fact]
    public void Discover_CleanFolder_LoadsThePlugin()
    {
        using var folder = PluginFolder.With(Plugin);

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path));

        Assert.True(rule.IsLoaded, rule.LoadMessage);
    }

    [Fact]
    public void Discover_GroupWritablePluginSubfolder_IsRefusedNamingIt()
    {
        using var folder = PluginFolder.With(Plugin);
        var subfolder = Path.Combine(folder.Path, Plugin);
        File.SetUnixFileMode(subfolder, Mode(0b111_111_101));

        var error = Assert.Throws<ProfileConfigurationException>(() => PluginDiscovery.Discover(folder.Path));

        var problem = Assert.Single(error.Problems);
        Assert.StartsWith(PluginFolderMessages.Prefix + subfolder + " (mode 0775, owner uid ", problem, StringComparison.Ordinal);
        Assert.Contains("writable by its group;", problem, StringComparison.Ordinal);
        Assert.Contains($"chmod go-w '{subfolder}'", problem, StringComparison.Ordinal);
        Assert.Contains(problem, error.Message, StringComparison.Ordinal);
        // A permission problem, not a mistake in the profiles.
        Assert.Equal(ProfileConfigurationException.AccessTitle, error.Title);
        Assert.StartsWith(ProfileConfigurationException.AccessTitle + ":", error.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("profile", error.Message, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void Problems_SeveralUnsafePaths_ListsEveryOne()
    {
        using var folder = PluginFolder.With(Plugin);
        var assembly = Path.Combine(folder.Path, Plugin, Plugin + ".dll");
        File.SetUnixFileMode(assembly, Mode(0b110_110_110));
        File.SetUnixFileMode(folder.Path, Mode(0b111_101_111));

        var problems = PluginFolderSafety.Problems(folder.Path, [Path.Combine(folder.Path, Plugin)]);

        Assert.Equal(2, problems.Count);
        Assert.Contains(problems, p => p.StartsWith(PluginFolderMessages.Prefix + folder.Path + " (mode 0757", StringComparison.Ordinal) && p.Contains("writable by others;", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith(PluginFolderMessages.Prefix + assembly + " (mode 0666", StringComparison.Ordinal) && p.Contains("writable by its group and by others;", StringComparison.Ordinal));
    }

    [Fact]
    public void Problems_WorldWritableAncestorWithoutStickyBit_IsNamed()
    {
        using var outer = PluginFolder.With();
        var plugins = PluginFolder.CreateFolder(Path.Combine(outer.Path, "plugins"));
        File.SetUnixFileMode(outer.Path, Mode(0b111_111_111));

        var problem = Assert.Single(PluginFolderSafety.Problems(plugins, []));

        Assert.StartsWith(PluginFolderMessages.Prefix + outer.Path + " (mode 0777", problem, StringComparison.Ordinal);
        Assert.Contains("world-writable without the sticky bit", problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Problems_WorldWritableStickyAncestor_IsAccepted()
    {
        using var outer = PluginFolder.With();
        var plugins = PluginFolder.CreateFolder(Path.Combine(outer.Path, "plugins"));
        // Common practice: /tmp is 1777; the sticky bit keeps others from renaming what they do not own.
        File.SetUnixFileMode(outer.Path, Mode(0b111_111_111) | UnixFileMode.StickyBit);

        Assert.Empty(PluginFolderSafety.Problems(plugins, []));
    }

    [Fact]
    public async Task Problems_BareAssemblyOwnedByAnotherUser_IsNamedWithBothUids()
    {
        // Handing a file to another user needs root; CI runs as root, a developer's machine may not.
        if (UnixFileStatus.EffectiveUserId != 0) return;
        using var folder = PluginFolder.With();
        var assembly = Path.Combine(folder.Path, "Lab.Rules.dll");
        PluginFolder.WriteFile(assembly, "not an assembly; ownership is checked before anything is read");
        var chown = await ChildProcess.RunAsync("chown", ["65534", assembly]);
        Assert.Equal(0, chown.ExitCode);

        var error = Assert.Throws<ProfileConfigurationException>(() => PluginDiscovery.Discover(folder.Path));

        var problem = Assert.Single(error.Problems);
        Assert.StartsWith(PluginFolderMessages.Prefix + assembly + " (mode 0644, owner uid 65534)", problem, StringComparison.Ordinal);
        Assert.Contains("owned neither by the host's user (uid 0) nor by root", problem, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0b111_101_101)]
    [InlineData(0b110_100_000)]
    [InlineData(0b111_111_111 | 0b1_000_000_000)]
    public async Task Read_ModeAndOwner_AgreeWithCoreutilsStat(int mode)
    {
        using var folder = PluginFolder.With();
        var path = Path.Combine(folder.Path, "probe");
        PluginFolder.WriteFile(path, "probe");
        File.SetUnixFileMode(path, (UnixFileMode)mode);

        // Source: GNU coreutils stat(1): %a is the octal mode, %u the owner's user id.
        var (exit, stdout, _) = await ChildProcess.RunAsync("stat", ["-c", "%a %u", path]);

        Assert.Equal(0, exit);
        var status = UnixFileStatus.Read(path, out var error) ?? throw new InvalidOperationException(error);
        Assert.Equal(stdout.Trim(), $"{Convert.ToString(status.Mode, 8)} {status.OwnerId}");
    }

    private static UnixFileMode Mode(int bits) => (UnixFileMode)bits;
}
