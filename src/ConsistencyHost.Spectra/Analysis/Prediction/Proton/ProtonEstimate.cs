namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>
/// Builds one window: a base value, additive increments, the half-width contributions that follow the method's
/// error, and any further values the window must cover (other geometry, the second H of a CH2). Reasons are kept
/// in the order they were applied, as data: they are written only when read (<see cref="ProtonReasonList"/>).
/// </summary>
internal sealed class ProtonEstimate
{
    private ProtonReason[] reasons = new ProtonReason[8];
    private int reasonCount;
    private WidthPart[]? widths;
    private int widthCount;
    private double lowest;
    private double highest;
    private double lowExtra;
    private double highExtra;

    /// <summary>The running estimate.</summary>
    public double Value { get; private set; }

    /// <summary>Sum of the symmetric half-width contributions so far.</summary>
    public double HalfWidth { get; private set; }

    /// <summary>Starts from a base or tabulated value.</summary>
    public ProtonEstimate Start(double value, string what) => Start(value, null, what);

    /// <summary>Starts from a value labelled <paramref name="prefix"/> + <paramref name="what"/>, joined only when read.</summary>
    public ProtonEstimate Start(double value, string? prefix, string what)
    {
        Value = lowest = highest = value;
        Append(new ProtonReason(ProtonReasonKind.Value, prefix, what, value));
        return this;
    }

    /// <summary>Adds an increment ("α-OC(=O)R +2.80").</summary>
    public void Add(double delta, string what) => Add(delta, null, what);

    /// <summary>Adds an increment labelled <paramref name="prefix"/> + <paramref name="what"/> ("α-" + "OH"), joined only when read.</summary>
    public void Add(double delta, string? prefix, string what)
    {
        Value += delta;
        lowest += delta;
        highest += delta;
        Append(new ProtonReason(ProtonReasonKind.Change, prefix, what, delta));
    }

    /// <summary>Notes a fact that changes nothing numerically.</summary>
    public void Note(string reason) => Append(new ProtonReason(ProtonReasonKind.Note, null, reason, 0));

    /// <summary>Adds to the symmetric half-width, with why.</summary>
    public void Widen(double ppm, string why) => Widen(ppm, 0, why);

    /// <summary>Adds to the symmetric half-width for <paramref name="count"/> things, written "3 substituents".</summary>
    public void Widen(double ppm, int count, string why)
    {
        HalfWidth += ppm;
        widths ??= new WidthPart[4];
        if (widthCount == widths.Length)
        {
            Array.Resize(ref widths, widthCount * 2);
        }

        widths[widthCount++] = new WidthPart(ppm, why, count);
    }

    /// <summary>Makes the window also cover <paramref name="value"/> (another geometry, another H on the atom).</summary>
    public void Cover(double value, string why)
    {
        lowest = Math.Min(lowest, value);
        highest = Math.Max(highest, value);
        Append(new ProtonReason(ProtonReasonKind.Value, null, why, value));
    }

    /// <summary>Stretches one side only (solvent effects that move a signal one way).</summary>
    public void Stretch(double down, double up, string why) => Stretch(down, up, null, why);

    /// <summary>Stretches one side only, the reason written <paramref name="prefix"/> + <paramref name="why"/> when read.</summary>
    public void Stretch(double down, double up, string? prefix, string why)
    {
        lowExtra += down;
        highExtra += up;
        Append(new ProtonReason(ProtonReasonKind.Note, prefix, why, 0));
    }

    /// <summary>Moves the estimate and everything covered by <paramref name="delta"/> (a solvent shift).</summary>
    public void Shift(double delta, string why) => Add(delta, why);

    /// <summary>The prediction with its window: [lowest − half-width, highest + half-width] plus one-sided stretches.</summary>
    public ShiftPrediction Finish(ShiftBasis basis)
    {
        var window = new ShiftWindow(lowest - HalfWidth - lowExtra, highest + HalfWidth + highExtra, Value);
        return new ShiftPrediction(window, basis, new ProtonReasonList(reasons, reasonCount, widths, widthCount, HalfWidth));
    }

    private void Append(ProtonReason reason)
    {
        if (reasonCount == reasons.Length)
        {
            Array.Resize(ref reasons, reasonCount * 2);
        }

        reasons[reasonCount++] = reason;
    }
}
