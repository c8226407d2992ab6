namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>
/// Collects one carbon's estimate: a base value, increments (equal labels merged into "×n"), the half-width and the
/// reasons for both. One small array per carbon; nothing is formatted until the reasons are read.
/// </summary>
internal sealed class CarbonEstimate
{
    /// <summary>Half-width every window carries for the referencing convention of the report.</summary>
    public const double ReferencingSpread = 0.3;

    private ReasonTerm[] terms = new ReasonTerm[10];
    private int count;

    /// <summary>The running estimate in ppm.</summary>
    public double Value { get; private set; }

    /// <summary>The running half-width in ppm.</summary>
    public double HalfWidth { get; private set; }

    /// <summary>Starts from a base value.</summary>
    public CarbonEstimate Base(string label, double ppm)
    {
        Value = ppm;
        Append(new ReasonTerm(ReasonKind.Base, label, 1, ppm));
        return this;
    }

    /// <summary>Adds an increment; an increment with the same label is merged ("α C ×2 +18.2").</summary>
    public void Add(string label, double ppm)
    {
        Value += ppm;
        for (var i = 0; i < count; i++)
        {
            if (terms[i].Kind == ReasonKind.Increment && ReferenceEquals(terms[i].Label, label))
            {
                terms[i] = terms[i] with { Count = terms[i].Count + 1, Ppm = terms[i].Ppm + ppm };
                return;
            }
        }

        Append(new ReasonTerm(ReasonKind.Increment, label, 1, ppm));
    }

    /// <summary>Adds an increment only when it is not zero.</summary>
    public void AddNonZero(string label, double ppm)
    {
        if (ppm != 0)
        {
            Add(label, ppm);
        }
    }

    /// <summary>Widens the window without a reason of its own (folded into the final half-width reason).</summary>
    public void Widen(double ppm) => HalfWidth += ppm;

    /// <summary>Widens the window and says why.</summary>
    public void Widen(string why, double ppm)
    {
        HalfWidth += ppm;
        Append(new ReasonTerm(ReasonKind.Note, why, 0, ppm));
    }

    /// <summary>Adds a plain phrase.</summary>
    public void Note(string phrase) => Append(new ReasonTerm(ReasonKind.Note, phrase, 0, 0));

    /// <summary>
    /// The window with its reasons; the last reason states the half-width, which includes the referencing spread
    /// (CDCl3 referenced at 77.0 or 77.16, DMSO-d6 at 39.5 or 39.52: common practice).
    /// </summary>
    public ShiftPrediction Build(ShiftBasis basis, string widthReason, int widthCount = 0)
    {
        HalfWidth += ReferencingSpread;
        Append(new ReasonTerm(ReasonKind.HalfWidth, widthReason, widthCount, HalfWidth));
        return new ShiftPrediction(ShiftWindow.Around(Value, HalfWidth), basis, new ReasonList(terms, count));
    }

    private void Append(ReasonTerm term)
    {
        if (count == terms.Length)
        {
            Array.Resize(ref terms, count * 2);
        }

        terms[count++] = term;
    }
}
