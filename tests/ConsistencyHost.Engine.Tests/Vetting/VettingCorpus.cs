using System.Collections.Immutable;
using ConsistencyHost.Engine.Vetting;
using ConsistencyHost.Sdk.Analyzers;
using ConsistencyHost.Tests.Shared;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;

namespace ConsistencyHost.Engine.Tests.Vetting;

/// <summary>The sample plugins of tests/fixtures/vetting, compiled the ways the tests compare.</summary>
internal static class VettingCorpus
{
    public static string Folder(string name) => VettingFixtures.Folder(name);

    /// <summary>Compiles a corpus plugin against the host's reference set, without analyzers.</summary>
    public static CSharpCompilation Compile(string name, params string[] extraSources) =>
        CSharpCompilation.Create(name,
            [
                SourcePluginReferences.GlobalUsings(SourcePluginReferences.ParseOptions),
                .. SourceFiles.Read(Folder(name)).Select(f => CSharpSyntaxTree.ParseText(f.Text, SourcePluginReferences.ParseOptions, f.RelativePath)),
                .. extraSources.Select(text => CSharpSyntaxTree.ParseText(text, SourcePluginReferences.ParseOptions)),
            ],
            SourcePluginReferences.All, SourcePluginReferences.Options);

    /// <summary>Compiles one source text as an assembly, as a plugin project would (optionally with unsafe code on).</summary>
    public static byte[] EmitSource(string assemblyName, string source, bool allowUnsafe = false) =>
        Emit(CSharpCompilation.Create(assemblyName,
            [SourcePluginReferences.GlobalUsings(SourcePluginReferences.ParseOptions), CSharpSyntaxTree.ParseText(source, SourcePluginReferences.ParseOptions)],
            SourcePluginReferences.All, SourcePluginReferences.Options.WithAllowUnsafe(allowUnsafe)));

    /// <summary>CHSDK diagnostics as a build with the SDK analyzers attached reports them (suppressed ones marked).</summary>
    public static IReadOnlyList<Diagnostic> AnalyzerDiagnostics(string name)
    {
        var analyzers = typeof(Descriptors).Assembly.GetTypes()
            .Where(t => !t.IsAbstract && t.IsSubclassOf(typeof(DiagnosticAnalyzer)))
            .Select(t => (DiagnosticAnalyzer)Activator.CreateInstance(t)!)
            .ToImmutableArray();
        var options = new CompilationWithAnalyzersOptions(new AnalyzerOptions([]), null, false, false, reportSuppressedDiagnostics: true);
        return [.. Compile(name).WithAnalyzers(analyzers, options).GetAnalyzerDiagnosticsAsync().GetAwaiter().GetResult()
            .Where(d => d.Id.StartsWith("CHSDK", StringComparison.Ordinal))];
    }

    /// <summary>Emits a compilation to bytes, failing the test on a compiler error.</summary>
    public static byte[] Emit(CSharpCompilation compilation)
    {
        using var image = new MemoryStream();
        var result = compilation.Emit(image);
        Assert.True(result.Success, string.Join("\n", result.Diagnostics));
        return image.ToArray();
    }

    /// <summary>Lays out an assembly as a compiled plugin folder: root/Name/Name.dll.</summary>
    public static void DropCompiled(string pluginsRoot, string name, byte[] image)
    {
        var folder = Path.Combine(pluginsRoot, name);
        Directory.CreateDirectory(folder);
        File.WriteAllBytes(Path.Combine(folder, name + ".dll"), image);
    }

    /// <summary>Copies the corpus sources as a source plugin folder: root/Name/*.cs.</summary>
    public static void DropSource(string pluginsRoot, string name) => PluginFolder.CopySourcePlugin(pluginsRoot, Folder(name));
}
