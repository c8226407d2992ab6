namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>The reasons of one carbon window, kept as <see cref="ReasonTerm"/>s and written on first read.</summary>
internal sealed class ReasonList : LazyReasons
{
    private readonly ReasonTerm[] terms;
    private readonly int count;

    public ReasonList(ReasonTerm[] terms, int count)
    {
        this.terms = terms;
        this.count = count;
    }

    public override int Count => count;

    /// <summary>A copy with one more term (the terms are copied, not written).</summary>
    public ReasonList With(ReasonTerm term)
    {
        var copy = new ReasonTerm[count + 1];
        Array.Copy(terms, copy, count);
        copy[count] = term;
        return new ReasonList(copy, count + 1);
    }

    protected override string[] Write()
    {
        var phrases = new string[count];
        for (var i = 0; i < count; i++)
        {
            phrases[i] = terms[i].Format();
        }

        return phrases;
    }
}
