using System.Collections;

namespace ConsistencyHost.Spectra.Analysis.Prediction;

/// <summary>
/// The reasons of one window as a read-only list of phrases, written on first read. The windows of every class of
/// every checked entry are computed, but their reasons are read only when a finding or the environments listing
/// shows them, so the terms stay data (labels and numbers) until then. Subclasses say how terms are written.
/// </summary>
internal abstract class LazyReasons : IReadOnlyList<string>
{
    private string[]? written;

    /// <summary>Number of phrases (known without writing them).</summary>
    public abstract int Count { get; }

    public string this[int index] => Written()[index];

    public IEnumerator<string> GetEnumerator() => ((IEnumerable<string>)Written()).GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    public override string ToString() => string.Join("; ", Written());

    /// <summary>Writes every phrase, in order (called at most once per reader race; the copies are equal).</summary>
    protected abstract string[] Write();

    private string[] Written() => written ??= Write();
}
