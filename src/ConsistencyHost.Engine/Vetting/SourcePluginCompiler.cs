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
/// Compiling hostile source can itself exhaust time and memory, so the compilation runs where
/// <paramref name="compilation"/> puts it — a worker process with time and memory limits when the host has
/// workers — and this class only checks the size of the sources first, and vets and caches the image that comes
/// back. Only the author's <c>.cs</c> files are used: no project file, editorconfig, analyzers or generators of theirs.
/// </remarks>
/// <param name="cacheRoot">Where vetted assemblies are cached.</param>
/// <param name="compilation">Where the compilation runs; null compiles in this process (<see cref="InProcessSourceCompilation.Default"/>).</param>
public sealed class SourcePluginCompiler(string cacheRoot, ISourceCompilation? compilation = null)
{
    private static readonly ImmutableArray<DiagnosticAnalyzer> Analyzers = [.. typeof(Descriptors).Assembly.GetTypes()
        .Where(type => type is { IsAbstract: false } && type.IsSubclassOf(typeof(DiagnosticAnalyzer)))
        .OrderBy(type => type.FullName, StringComparer.Ordinal)
        .Select(type => (DiagnosticAnalyzer)Activator.CreateInstance(type)!)];

    /// <summary>
    /// The most source a plugin may have, all its <c>.cs</c> files together. A lab's rule is a few kilobytes;
    /// a megabyte is far beyond any, and stops a plugin from making the host read gigabytes before compiling.
    /// </summary>
    public const long MaxSourceBytes = 1024 * 1024;

    /// <summary>Code of the problem that says the sources are larger than <see cref="MaxSourceBytes"/>.</summary>
    public const string SourceSizeCode = "source-size-limit";

    /// <summary>The default cache: a folder under the machine's temporary folder.</summary>
    public static string DefaultCacheRoot { get; } = Path.Combine(Path.GetTempPath(), "consistencyhost-source-plugins");

    /// <summary>Compiles, vets and caches the plugin in <paramref name="folder"/>; the assembly is named after the folder.</summary>
    public SourcePluginResult Compile(string folder)
    {
        var name = Path.GetFileName(Path.TrimEndingDirectorySeparator(folder));
        if (SourceBytes(folder) is var size and > MaxSourceBytes)
        {
            return new SourcePluginResult(null, [new VettingProblem(SourceSizeCode, $"{size} bytes of .cs files",
                $"more than the limit of {MaxSourceBytes} bytes for a source plugin", null)], false);
        }

        var sources = SourceFiles.Read(folder);
        var cached = Path.Combine(cacheRoot, Fingerprint(sources), name + ".dll");
        if (File.Exists(cached))
        {
            var again = CompiledPluginVetter.Default.Vet(cached);
            return new SourcePluginResult(again.IsAccepted ? cached : null, again.Problems, FromCache: true);
        }

        var compiled = (compilation ?? InProcessSourceCompilation.Default).Compile(name, sources);
        return compiled.Image is { } image && compiled.Problems.Count == 0
            ? VetAndCache(image, cached)
            : new SourcePluginResult(null, compiled.Problems.Count > 0 ? compiled.Problems
                : [new VettingProblem(SourceImage.CompilerFailureCode, "the compiler", "returned neither an assembly nor a reason", null)], false);
    }

    /// <summary>
    /// The compilation itself, wherever it runs (a worker process calls this): parses, analyses with the SDK
    /// analyzers and emits; the image is not vetted here — the host does that.
    /// </summary>
    public static SourceImage CompileImage(string assemblyName, IReadOnlyList<SourceFile> sources, CancellationToken cancellationToken)
    {
        var compilation = CSharpCompilation.Create(assemblyName, Trees(sources, cancellationToken), SourcePluginReferences.All, SourcePluginReferences.Options);
        var problems = Diagnose(compilation, cancellationToken);
        if (problems.Count > 0) return new SourceImage(null, problems);
        using var image = new MemoryStream();
        var emitted = compilation.Emit(image, cancellationToken: cancellationToken);
        return emitted.Success
            ? new SourceImage(image.ToArray(), [])
            : new SourceImage(null, [.. emitted.Diagnostics.Where(d => d.Severity == DiagnosticSeverity.Error).Select(ToProblem)]);
    }

    /// <summary>Every <c>.cs</c> file under the folder, build output included (an over-count only makes the check stricter).</summary>
    private static long SourceBytes(string folder) =>
        Directory.EnumerateFiles(folder, "*.cs", SearchOption.AllDirectories).Sum(path => new FileInfo(path).Length);

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
        return new VettingProblem(diagnostic.Id, FirstLine(diagnostic.GetMessage(System.Globalization.CultureInfo.InvariantCulture)), where + suppressed, null);
    }

    /// <summary>The image came from a compiler that may have been fed hostile source: vetted through its metadata before it is cached.</summary>
    /// <summary>
    /// An analyzer's exception (AD0001) carries its stack trace in the message; the refusal keeps the first line,
    /// which names the analyzer and the exception, cut at <see cref="MaxMessageLength"/> characters.
    /// </summary>
    private static string FirstLine(string message)
    {
        var line = message.AsSpan().TrimStart();
        var end = line.IndexOfAny('\r', '\n');
        if (end >= 0) line = line[..end];
        return line.Length <= MaxMessageLength ? line.ToString() : string.Concat(line[..MaxMessageLength], "…");
    }

    private const int MaxMessageLength = 300;

    private static SourcePluginResult VetAndCache(byte[] image, string cachedPath)
    {
        try
        {
            using var stream = new MemoryStream(image, writable: false);
            var vetted = CompiledPluginVetter.Default.Vet(stream);
            if (!vetted.IsAccepted)
            {
                return new SourcePluginResult(null, vetted.Problems, false);
            }
        }
        catch (BadImageFormatException error)
        {
            return new SourcePluginResult(null, [new VettingProblem(SourceImage.CompilerFailureCode, "the compiled image", $"is not a valid assembly: {error.Message}", null)], false);
        }

        Directory.CreateDirectory(Path.GetDirectoryName(cachedPath)!);
        var partial = cachedPath + "." + Environment.ProcessId + ".partial";
        File.WriteAllBytes(partial, image);
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
