namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Where the Roslyn compilation of a source plugin runs. Compiling is itself an attack surface: a 1.3 kB source
/// whose constant strings double past the metadata limit drove a host to 1.45 GB and an abort, and nested
/// overloaded lambdas kept the compiler busy for minutes without looking at its cancellation token. The host
/// therefore hands the compilation to a place that can be bounded in time and memory (a worker process, see
/// ConsistencyHost.Isolation) and only vets and caches the image that comes back.
/// </summary>
public interface ISourceCompilation
{
    /// <summary>
    /// Compiles the sources with the SDK analyzers attached. A compiler error, a CHSDK diagnostic, a crash or an
    /// overrun of the limits comes back as problems (one naming the limit), never as an exception.
    /// </summary>
    /// <param name="assemblyName">The plugin's folder name, which becomes its assembly name.</param>
    /// <param name="sources">The plugin's <c>.cs</c> files as the host read them.</param>
    SourceImage Compile(string assemblyName, IReadOnlyList<SourceFile> sources);
}

/// <summary>A compiled source plugin's assembly image (not yet vetted through its metadata), or why there is none.</summary>
/// <param name="Image">The emitted assembly; null when refused.</param>
/// <param name="Problems">Compiler errors, CHSDK diagnostics (suppressed ones included) or the limit that stopped the compiler.</param>
public sealed record SourceImage(byte[]? Image, IReadOnlyList<VettingProblem> Problems)
{
    /// <summary>Code of the problem that says the compiler overran its time limit.</summary>
    public const string TimeLimitCode = "compile-time-limit";

    /// <summary>Code of the problem that says the compiler died, ran out of memory or threw.</summary>
    public const string CompilerFailureCode = "compiler-failure";

    /// <summary>A refusal that is not about the plugin's code but about what compiling it did.</summary>
    public static SourceImage Refused(string code, string what, string because) => new(null, [new VettingProblem(code, what, because, null)]);
}
