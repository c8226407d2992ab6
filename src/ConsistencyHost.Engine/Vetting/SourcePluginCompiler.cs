using System.Collections.Immutable;
using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using ConsistencyHost.Sdk.Analyzers;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Compiles a source plugin (a folder of <c>.cs</c> files) with Roslyn, with the SDK analyzers attached, and
/// refuses it on any compiler error or any CHSDK diagnostic — also one the author suppressed with
/// <c>#pragma</c> or <c>[SuppressMessage]</c>. An accepted plugin is emitted, vetted again through its
/// metadata, and cached by a hash of its sources and of the host's compiler, SDK and analyzers.
/// </summary>
/// <remarks>
/// Compiling hostile source can itself take long; the host compiles at start-up with a cancellation token.
/// Only the author's <c>.cs</c> files are used: no project file, editorconfig, analyzers or generators of theirs.
/// </remarks>
public sealed class SourcePluginCompiler(string cacheRoot)
{
    private static readonly ImmutableArray<DiagnosticAnalyzer> Analyzers = [.. typeof(Descriptors).Assembly.GetTypes()
        .Where(type => type is { IsAbstract: false } && type.IsSubclassOf(typeof(DiagnosticAnalyzer)))
        .OrderBy(type => type.FullName, StringComparer.Ordinal)
        .Select(type => (DiagnosticAnalyzer)Activator.CreateInstance(type)!)];

    /// <summary>The default cache: a folder under the machine's temporary folder.</summary>
    public static string DefaultCacheRoot { get; } = Path.Combine(Path.GetTempPath(), "consistencyhost-source-plugins");

    /// <summary>Compiles, vets and caches the plugin in <paramref name="folder"/>; the assembly is named after the folder.</summary>
    public SourcePluginResult Compile(string folder, CancellationToken cancellationToken = default)
    {
        var name = Path.GetFileName(Path.TrimEndingDirectorySeparator(folder));
        var sources = SourceFiles.Read(folder);
        var cached = Path.Combine(cacheRoot, Fingerprint(sources), name + ".dll");
        if (File.Exists(cached))
        {
            var again = CompiledPluginVetter.Default.Vet(cached);
            return new SourcePluginResult(again.IsAccepted ? cached : null, again.Problems, FromCache: true);
        }

        var compilation = CSharpCompilation.Create(name, Trees(sources, cancellationToken), SourcePluginReferences.All, SourcePluginReferences.Options);
        var problems = Diagnose(compilation, cancellationToken);
        return problems.Count > 0 ? new SourcePluginResult(null, problems, false) : EmitAndVet(compilation, cached, cancellationToken);
    }

    private static List<SyntaxTree> Trees(IReadOnlyList<SourceFile> sources, CancellationToken cancellationToken) =>
    [
        SourcePluginReferences.GlobalUsings(SourcePluginReferences.ParseOptions),
        .. sources.Select(file => CSharpSyntaxTree.ParseText(file.Text, SourcePluginReferences.ParseOptions, file.RelativePath,
            Encoding.UTF8, cancellationToken)),
    ];

    private static List<VettingProblem> Diagnose(CSharpCompilation compilation, CancellationToken cancellationToken)
    {
        var options = new CompilationWithAnalyzersOptions(new AnalyzerOptions([]), onAnalyzerException: null,
            concurrentAnalysis: false, logAnalyzerExecutionTime: false, reportSuppressedDiagnostics: true);
        var diagnostics = compilation.WithAnalyzers(Analyzers, options).GetAllDiagnosticsAsync(cancellationToken).GetAwaiter().GetResult();
        return [.. diagnostics.Where(IsRefusal).OrderBy(d => d.Location.SourceSpan.Start).Select(ToProblem)];
    }

    private static bool IsRefusal(Diagnostic diagnostic) =>
        diagnostic.Id.StartsWith("CHSDK", StringComparison.Ordinal) || diagnostic.Id == "AD0001" ||
        (diagnostic.Severity == DiagnosticSeverity.Error && !diagnostic.IsSuppressed);

    private static VettingProblem ToProblem(Diagnostic diagnostic)
    {
        var span = diagnostic.Location.GetLineSpan();
        var where = diagnostic.Location.IsInSource
            ? $"at {span.Path}({span.StartLinePosition.Line + 1},{span.StartLinePosition.Character + 1})"
            : "for the whole plugin";
        var suppressed = diagnostic.IsSuppressed ? ", suppressed in the source but refused by the host" : "";
        return new VettingProblem(diagnostic.Id, diagnostic.GetMessage(System.Globalization.CultureInfo.InvariantCulture), where + suppressed, null);
    }

    private static SourcePluginResult EmitAndVet(CSharpCompilation compilation, string cachedPath, CancellationToken cancellationToken)
    {
        using var image = new MemoryStream();
        var emitted = compilation.Emit(image, cancellationToken: cancellationToken);
        if (!emitted.Success)
        {
            return new SourcePluginResult(null, [.. emitted.Diagnostics.Where(d => d.Severity == DiagnosticSeverity.Error).Select(ToProblem)], false);
        }

        image.Position = 0;
        var vetted = CompiledPluginVetter.Default.Vet(image);
        if (!vetted.IsAccepted)
        {
            return new SourcePluginResult(null, vetted.Problems, false);
        }

        Directory.CreateDirectory(Path.GetDirectoryName(cachedPath)!);
        var partial = cachedPath + "." + Environment.ProcessId + ".partial";
        File.WriteAllBytes(partial, image.ToArray());
        File.Move(partial, cachedPath, overwrite: true);
        return new SourcePluginResult(cachedPath, [], false);
    }

    /// <summary>Same sources with the same compiler, SDK and analyzers give the same assembly, so they share a cache entry.</summary>
    private static string Fingerprint(IReadOnlyList<SourceFile> sources)
    {
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        foreach (var assembly in new[] { typeof(CSharpCompilation).Assembly, typeof(Sdk.Rules.IRule).Assembly, typeof(Descriptors).Assembly })
        {
            hash.AppendData(assembly.ManifestModule.ModuleVersionId.ToByteArray());
        }

        foreach (var file in sources)
        {
            hash.AppendData(Encoding.UTF8.GetBytes(file.RelativePath + "\0" + file.Text + "\0"));
        }

        return Convert.ToHexStringLower(hash.GetHashAndReset())[..32];
    }
}
