namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Compiles source plugins inside the host: used only when the host has no worker executor (workers off, or
/// the embedded engine of tests and tools). The time limit is enforced from outside the compiler — the call
/// returns a refusal at the limit even when Roslyn does not observe its cancellation token — but the abandoned
/// compilation keeps its thread and memory until it ends, and nothing bounds its memory: a hostile source can
/// still take this process down (docs/reliability.md, "Source plugins").
/// </summary>
/// <param name="limit">The wall time a compilation may take.</param>
public sealed class InProcessSourceCompilation(TimeSpan limit) : ISourceCompilation
{
    /// <summary>
    /// A lab's plugin compiles in well under a second once Roslyn is warm (about five seconds for the first one
    /// in a process), so two minutes only stops a runaway.
    /// </summary>
    public static TimeSpan DefaultLimit { get; } = TimeSpan.FromMinutes(2);

    /// <summary>The compilation with <see cref="DefaultLimit"/>.</summary>
    public static InProcessSourceCompilation Default { get; } = new(DefaultLimit);

    /// <inheritdoc />
    public SourceImage Compile(string assemblyName, IReadOnlyList<SourceFile> sources)
    {
        var cancel = new CancellationTokenSource();
        // Task.Run: the compilation runs beside this wait, so the wait ends at the limit whatever Roslyn does.
        var compiling = Task.Run(() => SourcePluginCompiler.CompileImage(assemblyName, sources, cancel.Token), CancellationToken.None);
        try
        {
            if (compiling.Wait(limit)) return compiling.Result;
        }
        catch (AggregateException error) when (error.GetBaseException() is OperationCanceledException)
        {
            // Cancelled: only the limit below cancels it.
        }
        catch (AggregateException error)
        {
            var inner = error.GetBaseException();
            return SourceImage.Refused(SourceImage.CompilerFailureCode, "the compiler", $"threw {inner.GetType().Name}: {inner.Message}");
        }

        cancel.Cancel();
        _ = compiling.ContinueWith(_ => cancel.Dispose(), TaskScheduler.Default);
        return SourceImage.Refused(SourceImage.TimeLimitCode, "the compiler",
            $"compiling took longer than the limit of {limit.TotalSeconds:0} s (in the host process; the compilation was abandoned)");
    }
}
