using System.Collections;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>
/// The reasons of one carbon window as a read-only list of phrases. The phrases are written on first read: the
/// windows of every carbon of every checked entry are computed, but their reasons are read only when a finding
/// or the environments listing shows them.
/// </summary>
internal sealed class ReasonList : IReadOnlyList<string>
{
    private readonly ReasonTerm[] terms;
    private readonly int count;
    private string[]? written;

    public ReasonList(ReasonTerm[] terms, int count)
    {
        this.terms = terms;
        this.count = count;
    }

    public int Count => count;

    /// <summary>A copy with one more term (the terms are copied, not written).</summary>
    public ReasonList With(ReasonTerm term)
    {
        var copy = new ReasonTerm[count + 1];
        Array.Copy(terms, copy, count);
        copy[count] = term;
        return new ReasonList(copy, count + 1);
    }

    public string this[int index] => Written()[index];

    public IEnumerator<string> GetEnumerator() => ((IEnumerable<string>)Written()).GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    public override string ToString() => string.Join("; ", Written());

    private string[] Written()
    {
        if (written is { } done)
        {
            return done;
        }

        var phrases = new string[count];
        for (var i = 0; i < count; i++)
        {
            phrases[i] = terms[i].Format();
        }

        written = phrases;
        return phrases;
    }
}
