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
}
