using ConsistencyHost.Engine.Vetting;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Vetting;

public sealed class SourcePluginCompilerTests
{
    [Fact]
    public void Compile_SameSourcesTwice_SecondComesFromTheCache()
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropSource(folder.Path, "Vetting.Good");
        var compiler = new SourcePluginCompiler(Path.Combine(folder.Path, ".cache"));

        var cold = compiler.Compile(Path.Combine(folder.Path, "Vetting.Good"));
        var warm = compiler.Compile(Path.Combine(folder.Path, "Vetting.Good"));

        Assert.True(cold.IsAccepted, string.Join("; ", cold.Problems));
        Assert.False(cold.FromCache);
        Assert.True(warm.FromCache);
        Assert.Equal(cold.AssemblyPath, warm.AssemblyPath);
    }

    [Fact]
    public void Compile_ChangedSource_GetsANewCacheEntry()
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropSource(folder.Path, "Vetting.Good");
        var plugin = Path.Combine(folder.Path, "Vetting.Good");
        var compiler = new SourcePluginCompiler(Path.Combine(folder.Path, ".cache"));
        var first = compiler.Compile(plugin);

        File.AppendAllText(Path.Combine(plugin, "GoodRule.cs"), "\n// edited\n");
        var second = compiler.Compile(plugin);

        Assert.False(second.FromCache);
        Assert.NotEqual(first.AssemblyPath, second.AssemblyPath);
    }

    [Fact]
    public void Compile_SyntaxError_IsRefusedWithFileAndPosition()
    {
        using var folder = PluginFolder.With();
        var plugin = Directory.CreateDirectory(Path.Combine(folder.Path, "Lab.Broken")).FullName;
        File.WriteAllText(Path.Combine(plugin, "Broken.cs"), "namespace Lab;\npublic sealed class Broken {\n");

        var result = new SourcePluginCompiler(Path.Combine(folder.Path, ".cache")).Compile(plugin);

        Assert.False(result.IsAccepted);
        var problem = Assert.Single(result.Problems);
        Assert.Equal("CS1513", problem.Code);
        Assert.StartsWith("at Broken.cs(2,", problem.Because);
    }

    [Fact]
    public void Compile_PragmaSuppressedDiagnostic_IsReportedAsSuppressedAndRefused()
    {
        var result = new SourcePluginCompiler(Path.Combine(Path.GetTempPath(), "ch-cache-" + Guid.NewGuid().ToString("N")))
            .Compile(VettingCorpus.Folder("Vetting.SuppressedClock"));

        var problem = Assert.Single(result.Problems);
        Assert.Equal("CHSDK2001", problem.Code);
        Assert.EndsWith("suppressed in the source but refused by the host", problem.Because);
    }

    [Fact]
    public void Compile_SourcesOverTheSizeLimit_AreRefusedBeforeCompiling()
    {
        using var folder = PluginFolder.With();
        var plugin = Path.Combine(folder.Path, "Lab.Padded");
        // A valid rule file padded with a comment past the limit: only the size can refuse it.
        var padding = "// " + new string('x', (int)SourcePluginCompiler.MaxSourceBytes) + "\n";
        PluginFolder.WriteFile(Path.Combine(plugin, "GoodRule.cs"), padding + File.ReadAllText(Path.Combine(VettingCorpus.Folder("Vetting.Good"), "GoodRule.cs")));

        var result = new SourcePluginCompiler(Path.Combine(folder.Path, ".cache")).Compile(plugin);

        var problem = Assert.Single(result.Problems);
        Assert.Equal(SourcePluginCompiler.SourceSizeCode, problem.Code);
        Assert.Contains($"more than the limit of {SourcePluginCompiler.MaxSourceBytes} bytes", problem.Because, StringComparison.Ordinal);
        Assert.Null(result.AssemblyPath);
    }

    [Fact]
    public void Compile_InProcessCompilationPastItsLimit_IsRefusedNamingTheLimit()
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropSource(folder.Path, "Vetting.Good");
        // A zero limit: the wait ends before any compilation can, whatever Roslyn does with its token.
        var compiler = new SourcePluginCompiler(Path.Combine(folder.Path, ".cache"), new InProcessSourceCompilation(TimeSpan.Zero));

        var result = compiler.Compile(Path.Combine(folder.Path, "Vetting.Good"));

        var problem = Assert.Single(result.Problems);
        Assert.Equal(SourceImage.TimeLimitCode, problem.Code);
        Assert.Contains("took longer than the limit of 0 s", problem.Because, StringComparison.Ordinal);
    }
}
