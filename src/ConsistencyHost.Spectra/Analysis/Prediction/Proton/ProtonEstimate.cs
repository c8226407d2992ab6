namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>
/// Builds one window: a base value, additive increments, the half-width contributions that follow the method's
/// error, and any further values the window must cover (other geometry, the second H of a CH2). Reasons are kept
/// in the order they were applied.
/// </summary>
internal sealed class ProtonEstimate
{
    private readonly List<string> reasons = new(8);
    private readonly List<(double Ppm, string Why)> widths = new(4);
    private double lowest;
    private double highest;
    private double lowExtra;
    private double highExtra;

    /// <summary>The running estimate.</summary>
    public double Value { get; private set; }

    /// <summary>Sum of the symmetric half-width contributions so far.</summary>
    public double HalfWidth { get; private set; }

    /// <summary>Starts from a base or tabulated value.</summary>
    public ProtonEstimate Start(double value, string what)
    {
        Value = lowest = highest = value;
        reasons.Add(what + " " + Ppm.Plain(value));
        return this;
    }

    /// <summary>Adds an increment ("α-OC(=O)R +2.80").</summary>
    public void Add(double delta, string what)
    {
        Value += delta;
        lowest += delta;
        highest += delta;
        reasons.Add(what + " " + Ppm.Signed(delta));
    }

    /// <summary>Notes a fact that changes nothing numerically.</summary>
    public void Note(string reason) => reasons.Add(reason);

    /// <summary>Adds to the symmetric half-width, with why.</summary>
    public void Widen(double ppm, string why)
    {
        HalfWidth += ppm;
        widths.Add((ppm, why));
    }

    /// <summary>Makes the window also cover <paramref name="value"/> (another geometry, another H on the atom).</summary>
    public void Cover(double value, string why)
    {
        lowest = Math.Min(lowest, value);
        highest = Math.Max(highest, value);
        reasons.Add(why + " " + Ppm.Plain(value));
    }

    /// <summary>Stretches one side only (solvent effects that move a signal one way).</summary>
    public void Stretch(double down, double up, string why)
    {
        lowExtra += down;
        highExtra += up;
        reasons.Add(why);
    }

    /// <summary>Moves the estimate and everything covered by <paramref name="delta"/> (a solvent shift).</summary>
    public void Shift(double delta, string why) => Add(delta, why);

    /// <summary>The prediction with its window: [lowest − half-width, highest + half-width] plus one-sided stretches.</summary>
    public ShiftPrediction Finish(ShiftBasis basis)
    {
        if (widths.Count > 0)
        {
            reasons.Add(WidthReason());
        }

        var window = new ShiftWindow(lowest - HalfWidth - lowExtra, highest + HalfWidth + highExtra, Value);
        return new ShiftPrediction(window, basis, reasons);
    }

    private string WidthReason()
    {
        var text = "±" + Ppm.Plain(HalfWidth) + ":";
        for (var i = 0; i < widths.Count; i++)
        {
            text += (i == 0 ? " " : ", ") + widths[i].Why + (i == 0 ? " " + Ppm.Plain(widths[i].Ppm) : " " + Ppm.Signed(widths[i].Ppm));
        }

        return text;
    }
}
